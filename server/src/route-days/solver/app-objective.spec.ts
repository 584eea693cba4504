import { checkSolution } from './check-solution';
import { euclideanMatrix, matrixFromArrays, matrixToArrays } from './matrix';
import { solve } from './solve';
import type { SolverInput, SolverStop, Vehicle } from './types';

/** One sharpener's day from place 0; places 1..6 on a line, 10 minutes apart. */
function day(stops: SolverStop[], vehicle: Partial<Vehicle> = {}, vehicles = 1): SolverInput {
  const pts = Array.from({ length: 7 }, (_, i) => ({ x: i * 10, y: 0 }));
  return {
    vehicles: Array.from({ length: vehicles }, (_, i) => ({
      id: `v${i}`,
      startPlace: 0,
      endPlace: 0,
      shiftStart: 480,
      latestFinish: 1020,
      ...vehicle,
    })),
    stops,
    matrix: euclideanMatrix(pts, { round: 'none' }),
    timeLimitMs: 30,
    seed: 5,
    objective: 'time',
  };
}

const stop = (id: string, place: number, extra: Partial<SolverStop> = {}): SolverStop => ({
  id,
  place,
  windows: [{ open: 480, close: 1020 }],
  serviceMinutes: 30,
  priority: 0,
  ...extra,
});

describe("the app's 'time' objective", () => {
  it('keeps one overdue stop rather than two ordinary ones when only one or the other fits', () => {
    // 320 minutes: the overdue stop alone (270) or both ordinary ones (about 290), never a mix.
    const input = day(
      [
        stop('overdue', 1, { priority: 5, serviceMinutes: 250 }),
        stop('a', 2, { serviceMinutes: 120 }),
        stop('b', 3, { serviceMinutes: 120 }),
      ],
      { latestFinish: 800 },
    );
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    expect(solution.routes.flatMap((r) => r.visits.map((v) => v.stopId))).toEqual(['overdue']);
    expect(solution.unplanned).toEqual([
      { stopId: 'a', reason: 'day-too-long' },
      { stopId: 'b', reason: 'day-too-long' },
    ]);
  });

  it('keeps a position lock with a lunch break and per-vehicle windows, and reports an unkeepable one', () => {
    const input = day(
      [
        stop('first', 5, { lock: { vehicleId: 'v1', position: 0 } }),
        stop('late', 4, { lock: { vehicleId: 'v1', position: 7 } }),
        stop('monday', 2, { vehicleWindows: { v0: [{ open: 700, close: 760 }] } }),
        stop('x', 1),
        stop('y', 3),
      ],
      { lunch: { earliest: 690, latest: 750, minutes: 30 } },
      2,
    );
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    expect(solution.routes.find((r) => r.vehicleId === 'v1')!.visits[0]!.stopId).toBe('first');
    expect(solution.routes.find((r) => r.vehicleId === 'v0')!.visits.some((v) => v.stopId === 'monday')).toBe(true);
    expect(solution.unplanned).toEqual([{ stopId: 'late', reason: 'lock-impossible' }]);
    for (const route of solution.routes) expect(route.lunchStart).toBeGreaterThanOrEqual(690);
  });
});

describe('matrixFromArrays', () => {
  it('rebuilds a matrix from structured-cloned arrays that solves the same as the original', () => {
    const input = day([stop('a', 1), stop('b', 4), stop('c', 2), stop('d', 6)]);
    const arrays = structuredClone(matrixToArrays(input.matrix));
    const rebuilt = matrixFromArrays(arrays);
    expect(rebuilt.size).toBe(7);
    expect(rebuilt.minutes(1, 4)).toBeCloseTo(30, 9);
    const steady = { ...input, maxWallMs: 60_000 }; // only the step budget may end it
    expect(solve({ ...steady, matrix: rebuilt })).toEqual(solve(steady));
  });

  it('refuses ragged or non-finite tables', () => {
    expect(() => matrixFromArrays({ minutes: [[0, 1]], distance: [[0, 1]] })).toThrow('row 0 is not 1 long');
    expect(() => matrixFromArrays({ minutes: [[0]], distance: [] })).toThrow('1 minute rows but 0 distance rows');
    expect(() => matrixFromArrays({ minutes: [[NaN]], distance: [[0]] })).toThrow('finite non-negative');
  });
});
