import { parseArgs, UsageError } from './route-bench';

describe('route-bench parseArgs', () => {
  it('reads the kind, the file and both options, with defaults when absent', () => {
    expect(parseArgs(['tsplib', 'eil51.tsp'])).toEqual({
      kind: 'tsplib',
      file: 'eil51.tsp',
      timeLimitMs: 2000,
      seed: 1,
    });
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
});
