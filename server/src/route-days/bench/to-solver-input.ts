/**
 * Turns benchmark instances into the app's SolverInput and the Solution back into benchmark terms, so the bench
 * exercises the same `solve` and matrix interface route days use.
 */
import { euclideanMatrix } from '../solver/matrix';
import type { SolverInput, Solution } from '../solver/types';
import type { SolomonInstance } from './solomon';
import type { TsplibInstance } from './tsplib';

/** "No window" for TSPLIB: far beyond any tour length in the library, still exact in floating point. */
export const OPEN_END = 1_000_000_000;

/** Solomon fleets never need more than this many vehicles for 100 customers (best known: at most 19). */
export const SOLOMON_FLEET = 25;

export interface RunOptions {
  timeLimitMs: number;
  seed: number;
  /** Hard wall-clock cap passed to the solver (its default when absent). */
  maxWallMs?: number;
}

/** One vehicle from node 1 back to node 1; every other node a stop with id = its TSPLIB node id. */
export function tsplibToSolverInput(instance: TsplibInstance, options: RunOptions): SolverInput {
  return {
    vehicles: [{ id: 'tour', startPlace: 0, endPlace: 0, shiftStart: 0, latestFinish: OPEN_END }],
    stops: instance.coords.slice(1).map((_, i) => ({
      id: String(i + 2),
      place: i + 1,
      windows: [{ open: 0, close: OPEN_END }],
      serviceMinutes: 0,
      priority: 0,
    })),
    matrix: euclideanMatrix(instance.coords, { round: 'nint' }),
    timeLimitMs: options.timeLimitMs,
    ...(options.maxWallMs !== undefined ? { maxWallMs: options.maxWallMs } : {}),
    seed: options.seed,
    objective: 'distance',
  };
}

/** The closed cycle as node ids, listed once from node 1. Throws if the solver left a node out. */
export function tsplibTourFromSolution(instance: TsplibInstance, solution: Solution): number[] {
  if (solution.unplanned.length > 0) {
    throw new Error(
      `solver left ${solution.unplanned.length} TSPLIB nodes unplanned (first: ${solution.unplanned[0]?.stopId})`,
    );
  }
  const visits = solution.routes.flatMap((route) => route.visits.map((visit) => Number(visit.stopId)));
  const tour = [1, ...visits];
  if (tour.length !== instance.dimension) {
    throw new Error(`solver returned ${tour.length} nodes for a ${instance.dimension}-node instance`);
  }
  return tour;
}

/** Each vehicle leaves the depot (node 0) at its ready time and must be back by the depot's due; node id = place. */
export function solomonToSolverInput(
  instance: SolomonInstance,
  options: RunOptions & { vehicles?: number },
): SolverInput {
  const depot = instance.nodes[0];
  if (!depot) throw new Error('Solomon instance without a depot');
  const customers = instance.nodes.slice(1);
  const fleet = Math.min(options.vehicles ?? SOLOMON_FLEET, customers.length);
  return {
    vehicles: Array.from({ length: fleet }, (_, i) => ({
      id: `v${i + 1}`,
      startPlace: 0,
      endPlace: 0,
      shiftStart: depot.ready,
      latestFinish: instance.horizon,
      capacity: instance.capacity,
    })),
    stops: customers.map((node) => ({
      id: String(node.id),
      place: node.id,
      windows: [{ open: node.ready, close: node.due }],
      serviceMinutes: node.service,
      priority: 0,
      demand: node.demand,
    })),
    matrix: euclideanMatrix(instance.nodes, { round: 'none' }),
    timeLimitMs: options.timeLimitMs,
    ...(options.maxWallMs !== undefined ? { maxWallMs: options.maxWallMs } : {}),
    seed: options.seed,
    objective: 'vehicles-then-distance',
  };
}

export interface SolomonResult {
  /** Customer ids per used vehicle, in visiting order. */
  routes: number[][];
  vehicles: number;
  /** Sum of the routes' distances as the solver reports them. */
  distance: number;
  /** Customer ids the solver could not fit. */
  unplanned: number[];
}

export function solomonResultFromSolution(solution: Solution): SolomonResult {
  const used = solution.routes.filter((route) => route.visits.length > 0);
  return {
    routes: used.map((route) => route.visits.map((visit) => Number(visit.stopId))),
    vehicles: used.length,
    distance: used.reduce((sum, route) => sum + route.distance, 0),
    unplanned: solution.unplanned.map((u) => Number(u.stopId)),
  };
}
