import { checkSolution } from './check-solution';
import { euclideanMatrix, greatCircleMatrix } from './matrix';
import { mulberry32 } from './rng';
import { solve } from './solve';
import type { SolverInput, SolverStop, Vehicle } from './types';

/** Place 0 is the depot; stops use places 1..n. */
function randomVrptw(seed: number, n: number, vehicles: number): SolverInput {
  const rand = mulberry32(seed);
  const pts = [{ x: 50, y: 50 }, ...Array.from({ length: n }, () => ({ x: rand() * 100, y: rand() * 100 }))];
  const stops: SolverStop[] = pts.slice(1).map((_, i) => {
    const open = 480 + Math.floor(rand() * 300);
    const windows = [{ open, close: open + 60 + Math.floor(rand() * 120) }];
    if (rand() < 0.5) windows.push({ open: windows[0]!.close + 30, close: windows[0]!.close + 150 });
    return { id: `s${i}`, place: i + 1, windows, serviceMinutes: 10, priority: 0, demand: 1 + Math.floor(rand() * 3) };
  });
  const fleet: Vehicle[] = Array.from({ length: vehicles }, (_, i) => ({
    id: `v${i}`,
    startPlace: 0,
    endPlace: 0,
    shiftStart: 420,
    latestFinish: 1140,
    capacity: 40,
  }));
  return {
    vehicles: fleet,
    stops,
    matrix: euclideanMatrix(pts, { round: 'none' }),
    timeLimitMs: 20,
    seed,
    objective: 'time',
  };
}

function tourLength(input: SolverInput): number {
  return solve(input).routes.reduce((sum, r) => sum + r.distance, 0);
}

/** Held-Karp optimum of a closed tour from place 0 over places 1..n. */
function heldKarp(d: (a: number, b: number) => number, n: number): number {
  const full = 1 << n;
  const dp = new Float64Array(full * n).fill(Infinity);
  for (let j = 0; j < n; j++) dp[(1 << j) * n + j] = d(0, j + 1);
  for (let mask = 1; mask < full; mask++) {
    for (let j = 0; j < n; j++) {
      const cur = dp[mask * n + j]!;
      if (!(mask & (1 << j)) || cur === Infinity) continue;
      for (let k = 0; k < n; k++) {
        if (mask & (1 << k)) continue;
        const idx = (mask | (1 << k)) * n + k;
        dp[idx] = Math.min(dp[idx]!, cur + d(j + 1, k + 1));
      }
    }
  }
  let best = Infinity;
  for (let j = 0; j < n; j++) best = Math.min(best, dp[(full - 1) * n + j]! + d(j + 1, 0));
  return best;
}

function tsp(seed: number, n: number, timeLimitMs: number): SolverInput {
  const rand = mulberry32(seed);
  const pts = Array.from({ length: n }, () => ({ x: Math.floor(rand() * 1000), y: Math.floor(rand() * 1000) }));
  return {
    vehicles: [{ id: 'v', startPlace: 0, endPlace: 0, shiftStart: 0, latestFinish: 1e9 }],
    stops: pts.slice(1).map((_, i) => ({
      id: `p${i + 1}`,
      place: i + 1,
      windows: [{ open: 0, close: 1e9 }],
      serviceMinutes: 0,
      priority: 0,
    })),
    matrix: euclideanMatrix(pts, { round: 'nint' }),
    timeLimitMs,
    seed,
    objective: 'distance',
  };
}

function simpleDay(stops: SolverStop[], vehicle: Partial<Vehicle> = {}): SolverInput {
  const pts = Array.from({ length: 6 }, (_, i) => ({ x: i * 10, y: 0 }));
  return {
    vehicles: [{ id: 'v', startPlace: 0, endPlace: 0, shiftStart: 480, latestFinish: 1020, ...vehicle }],
    stops,
    matrix: euclideanMatrix(pts, { round: 'none' }),
    timeLimitMs: 10,
    seed: 1,
    objective: 'time',
  };
}

const allDay = [{ open: 480, close: 1020 }];

describe('route solver', () => {
  it('solves a random VRPTW (30 stops, 3 vehicles, 1-2 windows) feasibly', () => {
    const input = randomVrptw(7, 30, 3);
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    const planned = solution.routes.reduce((sum, r) => sum + r.visits.length, 0);
    expect(planned).toBeGreaterThanOrEqual(25);
  });

  it('gives the same answer for the same seed', () => {
    const input = randomVrptw(11, 30, 3);
    const slowMachine = { ...input, maxWallMs: 60_000 }; // only the step budget may end it
    expect(solve(slowMachine)).toEqual(solve({ ...slowMachine }));
  });

  it('the checker catches a broken window and a missing stop', () => {
    const input = randomVrptw(3, 10, 2);
    const solution = solve(input);
    const route = solution.routes[0]!;
    const broken = { ...solution, routes: [{ ...route, visits: route.visits.slice(1) }, ...solution.routes.slice(1)] };
    expect(checkSolution(input, broken).length).toBeGreaterThan(0);
  });

  it('leaves a stop whose only window closes before the day starts unplanned as window-closed', () => {
    const input = simpleDay([
      { id: 'early', place: 1, windows: [{ open: 300, close: 400 }], serviceMinutes: 10, priority: 0 },
      { id: 'ok', place: 2, windows: allDay, serviceMinutes: 10, priority: 0 },
    ]);
    const solution = solve(input);
    expect(solution.unplanned).toEqual([{ stopId: 'early', reason: 'window-closed' }]);
    expect(checkSolution(input, solution)).toEqual([]);
  });

  it('plans high-priority stops first when the day is too short', () => {
    const stops: SolverStop[] = [1, 2, 3, 4, 5].map((p) => ({
      id: `s${p}`,
      place: p,
      windows: allDay,
      serviceMinutes: 100,
      priority: p % 2 === 0 ? 5 : 0,
    }));
    const input = simpleDay(stops, { latestFinish: 480 + 320 });
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    const planned = solution.routes.flatMap((r) => r.visits.map((v) => v.stopId));
    expect(planned).toEqual(expect.arrayContaining(['s2', 's4']));
    expect(solution.unplanned.length).toBeGreaterThan(0);
    expect(solution.unplanned.every((u) => u.reason === 'day-too-long')).toBe(true);
  });

  it('honours vehicle and position locks', () => {
    const input = randomVrptw(5, 12, 2);
    input.stops[3]!.lock = { vehicleId: 'v1' };
    input.stops[4]!.lock = { vehicleId: 'v0', position: 0 };
    input.stops[4]!.windows = [{ open: 420, close: 1000 }];
    input.stops[3]!.windows = [{ open: 420, close: 1000 }];
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    expect(solution.routes.find((r) => r.vehicleId === 'v1')!.visits.some((v) => v.stopId === 's3')).toBe(true);
    expect(solution.routes.find((r) => r.vehicleId === 'v0')!.visits[0]!.stopId).toBe('s4');
  });

  it('reports a lock to a missing vehicle as lock-impossible', () => {
    const input = simpleDay([
      { id: 'x', place: 1, windows: allDay, serviceMinutes: 5, priority: 0, lock: { vehicleId: 'nobody' } },
    ]);
    expect(solve(input).unplanned).toEqual([{ stopId: 'x', reason: 'lock-impossible' }]);
  });

  it('respects capacity', () => {
    const stops: SolverStop[] = [1, 2, 3].map((p) => ({
      id: `s${p}`,
      place: p,
      windows: allDay,
      serviceMinutes: 5,
      priority: 0,
      demand: 4,
    }));
    const input = simpleDay(stops, { capacity: 9 });
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    expect(solution.routes[0]!.visits).toHaveLength(2);
    expect(solution.unplanned).toEqual([{ stopId: expect.any(String), reason: 'capacity' }]);
  });

  it('places a lunch break inside its window', () => {
    const stops: SolverStop[] = [1, 2, 3, 4].map((p) => ({
      id: `s${p}`,
      place: p,
      windows: allDay,
      serviceMinutes: 60,
      priority: 0,
    }));
    const input = simpleDay(stops, { lunch: { earliest: 690, latest: 750, minutes: 30 } });
    const solution = solve(input);
    expect(checkSolution(input, solution)).toEqual([]);
    const route = solution.routes[0]!;
    expect(route.lunchStart).toBeGreaterThanOrEqual(690);
    expect(route.lunchStart).toBeLessThanOrEqual(750);
    expect(solution.unplanned).toEqual([]);
  });

  it('finds the Held-Karp optimum of a 10-point TSP', () => {
    for (const seed of [1, 2, 3]) {
      const input = tsp(seed, 10, 20);
      const best = heldKarp((a, b) => input.matrix.distance(a, b), 9);
      expect(tourLength(input)).toBeLessThanOrEqual(best * 1.01 + 1e-9);
    }
  });

  it('computes great-circle distances', () => {
    // Paris (48.8566, 2.3522) to London (51.5074, -0.1278): about 344 km (from memory).
    const m = greatCircleMatrix(
      [
        { lat: 48.8566, lon: 2.3522 },
        { lat: 51.5074, lon: -0.1278 },
      ],
      { circuity: 1, speedKmh: 60 },
    );
    expect(m.distance(0, 1)).toBeGreaterThan(340);
    expect(m.distance(0, 1)).toBeLessThan(348);
    expect(m.minutes(0, 1)).toBeCloseTo(m.distance(0, 1), 6);
    const road = greatCircleMatrix([
      { lat: 48.8566, lon: 2.3522 },
      { lat: 51.5074, lon: -0.1278 },
    ]);
    expect(road.distance(0, 1)).toBeCloseTo(m.distance(0, 1) * 1.3, 6);
  });

  it('rounds TSPLIB EUC_2D distances with nint', () => {
    const m = euclideanMatrix(
      [
        { x: 0, y: 0 },
        { x: 1, y: 1 },
        { x: 3, y: 4 },
      ],
      { round: 'nint' },
    );
    expect(m.distance(0, 1)).toBe(1);
    expect(m.distance(0, 2)).toBe(5);
    expect(
      euclideanMatrix(
        [
          { x: 0, y: 0 },
          { x: 1, y: 1 },
        ],
        { round: 'none' },
      ).distance(0, 1),
    ).toBeCloseTo(Math.SQRT2, 9);
  });
});
