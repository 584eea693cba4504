/**
 * Route benchmark CLI: runs the app's solver on TSPLIB and Solomon instances and prints one JSON line.
 *   route-bench.ts tsplib FILE.tsp [--time-limit-ms N] [--seed N]
 *   route-bench.ts solomon FILE.txt [--time-limit-ms N] [--seed N]
 * Lengths and distances are recomputed from the coordinates here, not taken on the solver's word; an infeasible
 * answer exits 1. A Solomon line gains "unplanned" only when the solver left customers out.
 * Without --time-limit-ms the limits fit the benchmark targets' wall-clock budgets (see defaultBudget).
 */
import { existsSync, readFileSync } from 'node:fs';
import { basename, extname } from 'node:path';
import { solve } from '../solver/solve';
import type { Solution, SolverInput } from '../solver/types';
import { checkSolomonRoutes, parseSolomon } from './solomon';
import {
  solomonResultFromSolution,
  solomonToSolverInput,
  tsplibToSolverInput,
  tsplibTourFromSolution,
  type RunOptions,
} from './to-solver-input';
import { isPermutation, nearestNeighbourTour, parseTsplib, tourLength } from './tsplib';

const USAGE = [
  'usage: route-bench.ts tsplib FILE.tsp [--time-limit-ms N] [--seed N]',
  '       route-bench.ts solomon FILE.txt [--time-limit-ms N] [--seed N]',
].join('\n');

export class UsageError extends Error {}

export interface BenchArgs {
  kind: 'tsplib' | 'solomon';
  file: string;
  /** Absent: the default for the instance's size (defaultBudget). */
  timeLimitMs?: number;
  seed: number;
}

/**
 * Targets' budgets: TSP up to 150 nodes 2 s, larger TSP and Solomon 10 s, as printed wall ms on a 2-core machine.
 * The step budget (timeLimitMs) is about half of it on an idle machine; the wall cap keeps a loaded one inside it.
 */
export function defaultBudget(
  kind: BenchArgs['kind'],
  nodes: number,
): Required<Pick<RunOptions, 'timeLimitMs' | 'maxWallMs'>> {
  const wallMs = kind === 'tsplib' && nodes <= 150 ? 2000 : 10_000;
  return { timeLimitMs: wallMs / 2, maxWallMs: wallMs * 0.9 };
}

function runOptions(args: BenchArgs, nodes: number): RunOptions {
  if (args.timeLimitMs !== undefined) return { timeLimitMs: args.timeLimitMs, seed: args.seed };
  return { ...defaultBudget(args.kind, nodes), seed: args.seed };
}

export function parseArgs(argv: readonly string[]): BenchArgs {
  const [kind, file, ...rest] = argv;
  if (kind !== 'tsplib' && kind !== 'solomon') throw new UsageError(`unknown kind "${kind ?? ''}"`);
  if (!file || file.startsWith('--')) throw new UsageError('missing FILE');
  const options: { timeLimitMs?: number; seed: number } = { seed: 1 };
  for (let i = 0; i < rest.length; i += 2) {
    const flag = rest[i];
    const value = Number(rest[i + 1]);
    if (rest[i + 1] === undefined || !Number.isInteger(value) || value < 0) {
      throw new UsageError(`${flag} needs a non-negative integer`);
    }
    if (flag === '--time-limit-ms') options.timeLimitMs = value;
    else if (flag === '--seed') options.seed = value;
    else throw new UsageError(`unknown option "${flag}"`);
  }
  return { kind, file, ...options };
}

function timed<T>(run: () => T): { result: T; ms: number } {
  const started = performance.now();
  const result = run();
  return { result, ms: Math.round(performance.now() - started) };
}

/** One TSPLIB run as the CLI does it, with the solver's own input and answer for callers that check further. */
export function solveTsplib(args: BenchArgs): {
  input: SolverInput;
  solution: Solution;
  line: Record<string, unknown>;
} {
  const instance = parseTsplib(readFileSync(args.file, 'utf8'));
  const input = tsplibToSolverInput(instance, runOptions(args, instance.dimension));
  const { result, ms } = timed(() => solve(input));
  const tour = tsplibTourFromSolution(instance, result);
  if (!isPermutation(tour, instance.dimension)) throw new Error('solver tour does not visit every node exactly once');
  const line = {
    instance: instance.name,
    nodes: instance.dimension,
    length: tourLength(instance.coords, tour),
    tour,
    ms,
    nearestNeighbour: tourLength(instance.coords, nearestNeighbourTour(instance.coords)),
  };
  return { input, solution: result, line };
}

/** One Solomon run as the CLI does it; throws when the bench's own checker finds the answer infeasible. */
export function solveSolomon(args: BenchArgs): {
  input: SolverInput;
  solution: Solution;
  line: Record<string, unknown>;
} {
  const instance = parseSolomon(readFileSync(args.file, 'utf8'), basename(args.file, extname(args.file)));
  const input = solomonToSolverInput(instance, runOptions(args, instance.nodes.length));
  const { result, ms } = timed(() => solve(input));
  const outcome = solomonResultFromSolution(result);
  const check = checkSolomonRoutes(instance, outcome.routes, outcome.unplanned);
  if (check.problems.length > 0) throw new Error(`infeasible Solomon solution:\n  ${check.problems.join('\n  ')}`);
  if (Math.abs(check.distance - outcome.distance) > 1e-6 * Math.max(1, check.distance)) {
    process.stderr.write(`note: solver reports distance ${outcome.distance}, recomputed ${check.distance}\n`);
  }
  const line = {
    instance: instance.name,
    vehicles: outcome.vehicles,
    distance: Math.round(check.distance * 100) / 100,
    routes: outcome.routes,
    ms,
    // Only present when the solver could not fit everyone: such a run is not comparable with published results.
    ...(outcome.unplanned.length > 0 ? { unplanned: outcome.unplanned } : {}),
  };
  return { input, solution: result, line };
}

function main(argv: readonly string[]): number {
  let args: BenchArgs;
  try {
    args = parseArgs(argv);
    if (!existsSync(args.file)) throw new UsageError(`no such file: ${args.file}`);
  } catch (error) {
    if (!(error instanceof UsageError)) throw error;
    process.stderr.write(`${error.message}\n${USAGE}\n`);
    return 2;
  }
  const { line } = args.kind === 'tsplib' ? solveTsplib(args) : solveSolomon(args);
  process.stdout.write(`${JSON.stringify(line)}\n`);
  return 0;
}

if (require.main === module) {
  try {
    process.exitCode = main(process.argv.slice(2));
  } catch (error) {
    process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 1;
  }
}
