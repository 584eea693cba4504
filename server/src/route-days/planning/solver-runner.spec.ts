import { greatCircle } from './travel-matrix.service';
import { SolverRunner } from './solver-runner';
import type { WorkerInput } from './solve-worker';

// Under jest the worker compiles the solver's TypeScript first (ts-node), which takes a few seconds.
jest.setTimeout(30_000);

describe('SolverRunner', () => {
  // A ring of 60 invented stops around a base, all open all day: enough work to fill the solver's budget.
  const points = Array.from({ length: 61 }, (_, i) =>
    i === 0 ? { lat: 44.8, lon: -92.4 } : { lat: 44.8 + 0.05 * Math.sin(i), lon: -92.4 + 0.07 * Math.cos(i * 1.7) },
  );
  const input: WorkerInput = {
    vehicles: [{ id: 'day', startPlace: 0, endPlace: 0, shiftStart: 0, latestFinish: 1439 }],
    stops: points.slice(1).map((_, i) => ({
      id: `s${i}`,
      place: i + 1,
      windows: [{ open: 0, close: 1439 }],
      serviceMinutes: 5,
      priority: 0,
    })),
    matrix: greatCircle(points, { circuity: 1.3, averageSpeedKmh: 40 }),
    timeLimitMs: 800,
    seed: 7,
    objective: 'time',
  };

  it('solves in a worker thread, leaving the event loop free meanwhile', async () => {
    const sut = new SolverRunner();
    let ticks = 0;
    const timer = setInterval(() => ticks++, 20);
    const started = Date.now();
    const solution = await sut.solve(input);
    clearInterval(timer);
    const elapsed = Date.now() - started;
    expect(solution.routes[0]!.visits).toHaveLength(60);
    expect(solution.unplanned).toEqual([]);
    // Blocking the loop would leave no ticks at all; a free loop ticks about every 20 ms of the solve.
    expect(ticks).toBeGreaterThan(Math.min(5, elapsed / 100));
  });

  it('gives the same answer for the same seed, run after run', async () => {
    const sut = new SolverRunner();
    const [a, b] = await Promise.all([sut.solve(input), sut.solve(input)]);
    expect(a.routes[0]!.visits.map((v) => v.stopId)).toEqual(b.routes[0]!.visits.map((v) => v.stopId));
  });
});
