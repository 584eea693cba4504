import { defaultBudget, parseArgs, UsageError } from './route-bench';

describe('route-bench parseArgs', () => {
  it('reads the kind, the file and both options, with defaults when absent', () => {
    expect(parseArgs(['tsplib', 'eil51.tsp'])).toEqual({ kind: 'tsplib', file: 'eil51.tsp', seed: 1 });
    expect(parseArgs(['solomon', 'C101.txt', '--seed', '9', '--time-limit-ms', '500'])).toEqual({
      kind: 'solomon',
      file: 'C101.txt',
      timeLimitMs: 500,
      seed: 9,
    });
  });

  it.each([
    [[]],
    [['vrp', 'x.txt']],
    [['tsplib']],
    [['tsplib', 'x.tsp', '--seed']],
    [['tsplib', 'x.tsp', '--seed', '-1']],
    [['tsplib', 'x.tsp', '--fast', '1']],
  ])('refuses %j as a usage error', (argv) => {
    expect(() => parseArgs(argv)).toThrow(UsageError);
  });

  it('defaults to limits whose wall cap stays inside the targets (2 s up to 150 TSP nodes, else 10 s)', () => {
    for (const [kind, nodes, budget] of [
      ['tsplib', 51, 2000],
      ['tsplib', 150, 2000],
      ['tsplib', 151, 10_000],
      ['solomon', 101, 10_000],
    ] as const) {
      const sut = defaultBudget(kind, nodes);
      expect(sut.maxWallMs).toBeLessThan(budget);
      expect(sut.timeLimitMs).toBeLessThanOrEqual(sut.maxWallMs);
    }
  });
});
