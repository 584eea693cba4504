import { checkSolution } from './check-solution';
import { euclideanMatrix } from './matrix';
import { solve } from './solve';
import type { SolverInput, SolverStop, TimeWindow } from './types';

/** Two sharpeners' days from one depot (place 0); stops on a line, 10 minutes apart. */
function weekInput(stops: SolverStop[]): SolverInput {
  const pts = Array.from({ length: 8 }, (_, i) => ({ x: i * 10, y: 0 }));
  const day = { startPlace: 0, endPlace: 0, shiftStart: 480, latestFinish: 1020 };
  return {
    vehicles: [
      { id: 'mon', ...day },
      { id: 'tue', ...day },
    ],
    stops,
    matrix: euclideanMatrix(pts, { round: 'none' }),
    timeLimitMs: 20,
    seed: 3,
    objective: 'time',
  };
}

const allDay: TimeWindow[] = [{ open: 480, close: 1020 }];
const stop = (id: string, place: number, extra: Partial<SolverStop> = {}): SolverStop => ({
  id,
  place,
  windows: allDay,
  serviceMinutes: 20,
  priority: 0,
  ...extra,
});

const vehicleOf = (input: SolverInput, id: string): string | undefined =>
  solve(input).routes.find((r) => r.visits.some((v) => v.stopId === id))?.vehicleId;

describe('per-vehicle windows', () => {
  it('puts a stop only on the days that list it, inside that day’s window', () => {
    const input = weekInput([
      stop('tueOnly', 3, { vehicleWindows: { tue: [{ open: 600, close: 660 }] } }),
      stop('monOnly', 4, { vehicleWindows: { mon: [{ open: 500, close: 560 }], tue: [] } }),
      stop('either', 5),
    ]);
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    expect(solution.unplanned).toEqual([]);
    expect(vehicleOf(input, 'tueOnly')).toBe('tue');
    expect(vehicleOf(input, 'monOnly')).toBe('mon');
    const tueStart = solution.routes.flatMap((r) => r.visits).find((v) => v.stopId === 'tueOnly')!.start;
    expect(tueStart).toBeGreaterThanOrEqual(600);
    expect(tueStart).toBeLessThanOrEqual(660);
  });

  it('overrides the common windows: the per-vehicle window is the one kept', () => {
    // Common windows say morning; Tuesday's own window says afternoon, and only Tuesday is listed.
    const input = weekInput([
      stop('x', 2, { windows: [{ open: 480, close: 540 }], vehicleWindows: { tue: [{ open: 840, close: 900 }] } }),
    ]);
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    const visit = solution.routes.flatMap((r) => r.visits)[0]!;
    expect(solution.routes[0]!.vehicleId).toBe('tue');
    expect(visit.start).toBeGreaterThanOrEqual(840);
  });

  it('leaves a stop no vehicle has a usable window for unplanned as window-closed', () => {
    const input = weekInput([
      stop('nobody', 2, { vehicleWindows: {} }),
      stop('emptyLists', 3, { vehicleWindows: { mon: [], tue: [] } }),
      stop('otherDay', 4, { vehicleWindows: { wed: allDay } }),
      stop('prototypeName', 5, { vehicleWindows: { toString: allDay } }),
      stop('closedBeforeShift', 6, { vehicleWindows: { mon: [{ open: 300, close: 400 }] } }),
      stop('fine', 7),
    ]);
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    expect(solution.unplanned).toEqual(
      ['nobody', 'emptyLists', 'otherDay', 'prototypeName', 'closedBeforeShift'].map((stopId) => ({
        stopId,
        reason: 'window-closed',
      })),
    );
  });

  it('judges a vehicle-locked stop on its locked vehicle’s windows', () => {
    const input = weekInput([stop('locked', 2, { lock: { vehicleId: 'mon' }, vehicleWindows: { tue: allDay } })]);
    expect(solve(input).unplanned).toEqual([{ stopId: 'locked', reason: 'window-closed' }]);
  });

  it('the checker refuses a visit on a vehicle the stop has no window for, or outside that vehicle’s window', () => {
    const windows = { mon: [{ open: 500, close: 560 }] };
    const input = weekInput([stop('a', 2, { vehicleWindows: windows })]);
    // Solve without the per-vehicle rule, then judge that answer against the real input.
    const free = solve({ ...input, stops: [stop('a', 2, { windows: [{ open: 840, close: 900 }] })] });
    const errors = checkSolution(input, free);
    expect(errors.length).toBeGreaterThan(0);
    expect(errors.join('\n')).toMatch(/no window on tue's day|outside every window on mon's day/);
    expect(checkSolution(input, solve(input))).toEqual([]);
  });

  it('holds over a larger random week: every answer passes the independent checker', () => {
    let seed = 17;
    const rand = (): number => (seed = (seed * 16807) % 2147483647) / 2147483647;
    const stops = Array.from({ length: 7 }, (_, i) => {
      const open = 480 + Math.floor(rand() * 300);
      const own = { open, close: open + 90 };
      return stop(`s${i}`, i + 1, { vehicleWindows: rand() < 0.5 ? { mon: [own] } : { mon: allDay, tue: [own] } });
    });
    const input = weekInput(stops);
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    expect(solution.unplanned).toEqual([]);
  });
});
