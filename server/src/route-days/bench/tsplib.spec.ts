import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { referenceDir } from './reference-dir';
import { solve } from '../solver/solve';
import { tsplibToSolverInput, tsplibTourFromSolution, OPEN_END } from './to-solver-input';
import { euc2d, isPermutation, nearestNeighbourTour, nint, parseTour, parseTsplib, tourLength } from './tsplib';

const REFERENCE = referenceDir('tsplib');
const read = (file: string): string => readFileSync(join(REFERENCE, file), 'utf8');

// Published optima from shared/reference/README.md.
const OPTIMA = [
  { name: 'eil51', nodes: 51, optimum: 426 },
  { name: 'berlin52', nodes: 52, optimum: 7542 },
  { name: 'kroA100', nodes: 100, optimum: 21282 },
];

describe('parseTsplib', () => {
  it('reads eil51: name, dimension and the coordinates of known nodes', () => {
    const sut = parseTsplib(read('eil51.tsp'));
    expect(sut.name).toBe('eil51');
    expect(sut.dimension).toBe(51);
    expect(sut.coords).toHaveLength(51);
    expect(sut.coords[0]).toEqual({ x: 37, y: 52 });
    expect(sut.coords[50]).toEqual({ x: 30, y: 40 });
  });

  it('reads "KEY: value" headers, decimals and exponent notation', () => {
    expect(parseTsplib(read('berlin52.tsp')).coords[1]).toEqual({ x: 25, y: 185 });
    const rd100 = parseTsplib(read('rd100.tsp'));
    expect(rd100.dimension).toBe(100);
    expect(rd100.coords[1]).toEqual({ x: 881.78, y: 1.18319 });
  });

  it('refuses edge weight types other than EUC_2D with a clear message', () => {
    const text = 'NAME: x\nTYPE: TSP\nDIMENSION: 2\nEDGE_WEIGHT_TYPE: GEO\nNODE_COORD_SECTION\n1 0 0\n2 1 1\nEOF\n';
    expect(() => parseTsplib(text)).toThrow('only EDGE_WEIGHT_TYPE EUC_2D is supported, got "GEO"');
  });

  it('refuses a coordinate section that does not match DIMENSION', () => {
    const text = 'NAME: x\nDIMENSION: 3\nEDGE_WEIGHT_TYPE: EUC_2D\nNODE_COORD_SECTION\n1 0 0\n2 1 1\nEOF\n';
    expect(() => parseTsplib(text)).toThrow('node 3 has no coordinates');
  });
});

describe('parseTour', () => {
  it('reads one id per line up to -1', () => {
    const tour = parseTour(read('eil51.opt.tour'));
    expect(tour).toHaveLength(51);
    expect(tour.slice(0, 3)).toEqual([1, 22, 8]);
    expect(isPermutation(tour, 51)).toBe(true);
  });

  it('reads several ids per line and no DIMENSION (rd100)', () => {
    const tour = parseTour(read('rd100.opt.tour'));
    expect(tour.slice(0, 3)).toEqual([1, 18, 62]);
    expect(isPermutation(tour, 100)).toBe(true);
  });

  it('refuses a tour without the closing -1', () => {
    expect(() => parseTour('TYPE : TOUR\nTOUR_SECTION\n1\n2\nEOF\n')).toThrow('does not end with -1');
  });
});

describe('tourLength', () => {
  it('rounds each leg with nint = floor(x + 0.5) over the closed cycle', () => {
    expect(nint(2.5)).toBe(3);
    expect(nint(2.49)).toBe(2);
    // Legs 3-4-5 triangle plus a 0.5-long rounding case: 3 + 4 + 5.
    expect(
      tourLength(
        [
          { x: 0, y: 0 },
          { x: 3, y: 0 },
          { x: 3, y: 4 },
        ],
        [1, 2, 3],
      ),
    ).toBe(12);
    expect(euc2d({ x: 0, y: 0 }, { x: 1, y: 1 })).toBe(1);
  });

  it.each(OPTIMA)('gives the published optimum for the $name optimal tour ($optimum)', ({ name, nodes, optimum }) => {
    const instance = parseTsplib(read(`${name}.tsp`));
    const tour = parseTour(read(`${name}.opt.tour`));
    expect(instance.dimension).toBe(nodes);
    expect(isPermutation(tour, nodes)).toBe(true);
    expect(tourLength(instance.coords, tour)).toBe(optimum);
  });
});

describe('nearestNeighbourTour', () => {
  it.each(OPTIMA)('starts at node 1, visits every $name node once, and is no shorter than the optimum', (case_) => {
    const instance = parseTsplib(read(`${case_.name}.tsp`));
    const tour = nearestNeighbourTour(instance.coords);
    expect(tour[0]).toBe(1);
    expect(isPermutation(tour, case_.nodes)).toBe(true);
    expect(tourLength(instance.coords, tour)).toBeGreaterThanOrEqual(case_.optimum);
  });
});

describe('tsplibToSolverInput', () => {
  it('makes one open-ended vehicle at node 1 and one windowless stop per other node', () => {
    const instance = parseTsplib(read('eil51.tsp'));
    const sut = tsplibToSolverInput(instance, { timeLimitMs: 100, seed: 7 });
    expect(sut.objective).toBe('distance');
    expect(sut.vehicles).toEqual([{ id: 'tour', startPlace: 0, endPlace: 0, shiftStart: 0, latestFinish: OPEN_END }]);
    expect(sut.stops).toHaveLength(50);
    expect(sut.stops[0]).toEqual({
      id: '2',
      place: 1,
      windows: [{ open: 0, close: OPEN_END }],
      serviceMinutes: 0,
      priority: 0,
    });
    expect(sut.stops.every((stop) => stop.windows.length === 1)).toBe(true);
    expect(sut.matrix.size).toBe(51);
    // Node 1 (37,52) to node 2 (49,49): sqrt(153) = 12.37 -> 12 under nint.
    expect(sut.matrix.distance(0, 1)).toBe(12);
    expect(sut.timeLimitMs).toBe(100);
    expect(sut.seed).toBe(7);
  });
});

describe('tsplibTourFromSolution', () => {
  const instance = parseTsplib(
    'NAME: t\nDIMENSION: 3\nEDGE_WEIGHT_TYPE: EUC_2D\nNODE_COORD_SECTION\n1 0 0\n2 1 0\n3 0 1\n',
  );
  const visits = (ids: string[]) => ids.map((stopId) => ({ stopId, arrival: 0, start: 0, leave: 0 }));
  const route = { vehicleId: 'tour', departure: 0, finish: 0, distance: 0, driveMinutes: 0, serviceMinutes: 0 };

  it('lists the cycle once from node 1', () => {
    const solution = { routes: [{ ...route, visits: visits(['3', '2']) }], unplanned: [] };
    expect(tsplibTourFromSolution(instance, solution)).toEqual([1, 3, 2]);
  });

  it('refuses a solution that left a node out', () => {
    const solution = {
      routes: [{ ...route, visits: visits(['3']) }],
      unplanned: [{ stopId: '2', reason: 'day-too-long' as const }],
    };
    expect(() => tsplibTourFromSolution(instance, solution)).toThrow('left 1 TSPLIB nodes unplanned');
  });
});

describe('solving eil51 through SolverInput (correctness, not speed)', () => {
  it('returns a tour through every node once, within 10% of the optimum 426', () => {
    const instance = parseTsplib(read('eil51.tsp'));
    const solution = solve(tsplibToSolverInput(instance, { timeLimitMs: 300, seed: 1 }));
    const tour = tsplibTourFromSolution(instance, solution);
    expect(tour[0]).toBe(1);
    expect(isPermutation(tour, 51)).toBe(true);
    expect(tourLength(instance.coords, tour)).toBeLessThanOrEqual(1.1 * 426);
  }, 30_000);
});
