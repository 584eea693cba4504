/**
 * The published reference instances through the CLI's own code path (solveTsplib / solveSolomon), with loose bounds
 * and short limits: these catch a broken solver, they do not measure it (docs/benchmarks.md does).
 */
import { join } from 'node:path';
import { referenceDir } from './reference-dir';
import { checkSolution } from '../solver/check-solution';
import { solveSolomon, solveTsplib } from './route-bench';
import { isPermutation } from './tsplib';

const REFERENCE = referenceDir();

// Proven optimal tour lengths: TSPLIB (G. Reinelt, ORSA Journal on Computing 3(4), 1991), as listed in
// shared/reference/README.md.
const TSPLIB = [
  { name: 'eil51', nodes: 51, optimum: 426 },
  { name: 'kroA100', nodes: 100, optimum: 21282 },
  { name: 'ch150', nodes: 150, optimum: 6528 },
];

// Best published (vehicles, distance): Solomon instances (M. M. Solomon, Operations Research 35(2), 1987), best-known
// values as listed in shared/reference/README.md.
const SOLOMON = [
  { name: 'C101', vehicles: 10, distance: 828.94 },
  { name: 'R101', vehicles: 19, distance: 1650.8 },
  { name: 'RC201', vehicles: 4, distance: 1406.94 },
];

describe('reference instances through the bench code path', () => {
  it.each(TSPLIB)(
    '$name: a full tour within 5% of the TSPLIB optimum $optimum',
    ({ name, nodes, optimum }) => {
      const { input, solution, line } = solveTsplib({
        kind: 'tsplib',
        file: join(REFERENCE, 'tsplib', `${name}.tsp`),
        timeLimitMs: 300,
        seed: 1,
      });
      expect(checkSolution(input, solution)).toEqual([]);
      expect(line.nodes).toBe(nodes);
      expect(isPermutation(line.tour as number[], nodes)).toBe(true);
      expect(line.length).toBeGreaterThanOrEqual(optimum);
      expect(line.length).toBeLessThanOrEqual(optimum * 1.05);
      expect(line.length).toBeLessThan(line.nearestNeighbour as number);
    },
    30_000,
  );

  it.each(SOLOMON)(
    '$name: feasible, every customer served, at most 2 vehicles over the best published $vehicles',
    ({ name, vehicles, distance }) => {
      const { input, solution, line } = solveSolomon({
        kind: 'solomon',
        file: join(REFERENCE, 'solomon', `${name}.txt`),
        timeLimitMs: 1000,
        seed: 1,
      });
      expect(checkSolution(input, solution)).toEqual([]);
      expect(line.unplanned).toBeUndefined();
      expect((line.routes as number[][]).flat().sort((a, b) => a - b)).toEqual(
        Array.from({ length: 100 }, (_, i) => i + 1),
      );
      expect(line.vehicles).toBeLessThanOrEqual(vehicles + 2);
      expect(line.distance).toBeLessThanOrEqual(distance * 1.2);
    },
    30_000,
  );
});
