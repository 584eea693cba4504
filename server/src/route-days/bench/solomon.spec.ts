import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { referenceDir } from './reference-dir';
import { checkSolomonRoutes, parseSolomon } from './solomon';
import type { PlannedRoute } from '../solver/types';
import { SOLOMON_FLEET, solomonResultFromSolution, solomonToSolverInput } from './to-solver-input';

const REFERENCE = referenceDir('solomon');
const load = (name: string) => parseSolomon(readFileSync(join(REFERENCE, `${name}.txt`), 'utf8'), name);

describe('parseSolomon', () => {
  it('reads C101: capacity 200, the depot and 100 customers', () => {
    const sut = load('C101');
    expect(sut.name).toBe('C101');
    expect(sut.capacity).toBe(200);
    expect(sut.nodes).toHaveLength(101);
    expect(sut.nodes[0]).toEqual({ id: 0, x: 40, y: 50, demand: 0, ready: 0, due: 1236, service: 0 });
    expect(sut.nodes[1]).toEqual({ id: 1, x: 55, y: 85, demand: 20, ready: 647, due: 726, service: 90 });
    expect(sut.horizon).toBe(1236);
  });

  it.each(['C105', 'C201', 'R101', 'R105', 'R201', 'RC101', 'RC105', 'RC201'])('reads %s', (name) => {
    const sut = load(name);
    expect(sut.nodes).toHaveLength(101);
    expect(sut.nodes.every((node, i) => node.id === i && node.ready <= node.due)).toBe(true);
  });

  it('refuses a file without the capacity line', () => {
    expect(() => parseSolomon('0 40 50 0 0 1236 0\n', 'x')).toThrow('first line must be the vehicle capacity');
  });
});

describe('checkSolomonRoutes', () => {
  const text = ['10', '0 0 0 0 0 100 0', '1 3 4 5 0 10 1', '2 0 4 6 20 30 1'].join('\n');
  const tiny = parseSolomon(text, 'tiny');

  it('measures real-valued distance and accepts a feasible plan (waiting for a window is allowed)', () => {
    // Customer 2 alone: 4 there, wait to 20, serve 1, 4 back.
    const sut = checkSolomonRoutes(tiny, [[1], [2]]);
    expect(sut.problems).toEqual([]);
    expect(sut.distance).toBeCloseTo(5 + 5 + 4 + 4);
  });

  it('reports capacity, late service and missing customers', () => {
    expect(checkSolomonRoutes(tiny, [[2, 1]]).problems).toEqual([
      'route 1: customer 1 starts at 24 after 10',
      'route 1: load 11 over capacity 10',
    ]);
    expect(checkSolomonRoutes(tiny, [[1]]).problems).toEqual(['customer 2 is served 0 times']);
    expect(checkSolomonRoutes(tiny, [[1]], [2]).problems).toEqual([]);
    expect(checkSolomonRoutes(tiny, [[1], [2]], [2]).problems).toEqual(['customer 2 is served 1 times']);
  });
});

describe('solomonToSolverInput', () => {
  it('makes one stop per customer with its window, service and demand, and a fleet of capacity-200 vehicles', () => {
    const instance = load('C101');
    const sut = solomonToSolverInput(instance, { timeLimitMs: 100, seed: 1 });
    expect(sut.objective).toBe('vehicles-then-distance');
    expect(sut.stops).toHaveLength(100);
    expect(sut.stops[0]).toEqual({
      id: '1',
      place: 1,
      windows: [{ open: 647, close: 726 }],
      serviceMinutes: 90,
      priority: 0,
      demand: 20,
    });
    expect(sut.stops.every((stop) => stop.windows.length === 1)).toBe(true);
    expect(sut.vehicles).toHaveLength(SOLOMON_FLEET);
    expect(sut.vehicles[0]).toEqual({
      id: 'v1',
      startPlace: 0,
      endPlace: 0,
      shiftStart: 0,
      latestFinish: 1236,
      capacity: 200,
    });
    expect(sut.matrix.size).toBe(101);
    // Depot (40,50) to customer 1 (55,85): unrounded sqrt(1450).
    expect(sut.matrix.distance(0, 1)).toBeCloseTo(Math.sqrt(1450), 9);
  });
});

describe('solomonResultFromSolution', () => {
  const route = (vehicleId: string, stopIds: string[], distance: number): PlannedRoute => ({
    vehicleId,
    visits: stopIds.map((stopId) => ({ stopId, arrival: 0, start: 0, leave: 0 })),
    departure: 0,
    finish: 0,
    distance,
    driveMinutes: distance,
    serviceMinutes: 0,
  });

  it('keeps non-empty routes as customer ids, counts them and sums their distance', () => {
    const sut = solomonResultFromSolution({
      routes: [route('v1', ['5', '3'], 10.5), route('v2', [], 0), route('v3', ['7'], 2.25)],
      unplanned: [{ stopId: '9', reason: 'capacity' }],
    });
    expect(sut).toEqual({ routes: [[5, 3], [7]], vehicles: 2, distance: 12.75, unplanned: [9] });
  });
});
