/**
 * Keenroute's route solver: a small vehicle-routing solver with time windows (several windows per stop, lunch breaks,
 * capacity, vehicle and position locks, priorities). No well-kept registry package does VRPTW with these constraints
 * for Node, so this one is ours.
 *
 * Shape: regret-2 construction (locked stops first; in the 'time' objective by priority, high to low), then local
 * search (2-opt with neighbour lists and don't-look bits, Or-opt, relocate, exchange, re-inserting unplanned stops), then seeded kicks (double bridge, ruin-and-recreate)
 * accepted when better; for 'vehicles-then-distance' fewer used vehicles ranks first. (A dedicated route-elimination
 * loop is not in yet.)
 *
 * Determinism: the budget is counted in simulated route steps (timeLimitMs x STEPS_PER_MS), not in wall time, so the
 * same input and seed give the same answer. The wall clock (timeLimitMs x WALL_FACTOR) only cuts in as a safety net
 * on a slow machine (plus WALL_SLACK_MS); only then may answers differ between runs.
 */
import { regretInsert, reasonFor } from './insertion';
import { doubleBridge, interRoute, neighbourLists, orOpt, twoOpt } from './local-search';
import { mulberry32 } from './rng';
import { simulate, type Ctx, type Schedule } from './route-eval';
import type { PlannedRoute, Solution, SolverInput } from './types';

const STEPS_PER_MS = 2000;
const WALL_FACTOR = 3;
/** Fixed slack on the wall clock so a cold start (JIT warm-up) does not cut short small, quick solves. */
const WALL_SLACK_MS = 250;

interface State {
  routes: number[][];
  costs: number[];
  unplanned: number[];
}

function key(ctx: Ctx, s: State): number[] {
  const pri = s.unplanned.reduce((sum, si) => sum + ctx.stops[si]!.priority, 0);
  const used = s.routes.filter((r) => r.length > 0).length;
  const total = s.costs.reduce((a, b) => a + b, 0);
  return [
    s.unplanned.length,
    ctx.input.objective === 'time' ? pri : 0,
    ctx.input.objective === 'vehicles-then-distance' ? used : 0,
    total,
  ];
}

function better(a: number[], b: number[]): boolean {
  for (let i = 0; i < a.length; i++) {
    if (a[i]! < b[i]! - 1e-9) return true;
    if (a[i]! > b[i]! + 1e-9) return false;
  }
  return false;
}

function copy(s: State): State {
  return { routes: s.routes.map((r) => [...r]), costs: [...s.costs], unplanned: [...s.unplanned] };
}

/** Locked-with-position stops first (appended in position order), then locked, then by priority groups. */
function construct(ctx: Ctx, s: State, pool: number[]): void {
  const byPos = pool
    .filter((si) => ctx.stops[si]!.lock?.position !== undefined)
    .sort((a, b) => ctx.stops[a]!.lock!.position! - ctx.stops[b]!.lock!.position! || a - b);
  for (const si of byPos) {
    const vi = ctx.vehicles.findIndex((v) => v.id === ctx.stops[si]!.lock!.vehicleId);
    const next = vi < 0 ? [] : [...s.routes[vi]!, si];
    const c = vi < 0 ? Infinity : simulate(ctx, vi, next);
    if (c < Infinity) {
      s.routes[vi] = next;
      s.costs[vi] = c;
    } else s.unplanned.push(si);
  }
  const rest = pool.filter((si) => ctx.stops[si]!.lock?.position === undefined);
  const groups: number[][] = [rest.filter((si) => ctx.stops[si]!.lock)];
  const free = rest.filter((si) => !ctx.stops[si]!.lock);
  if (ctx.input.objective === 'time') {
    const levels = [...new Set(free.map((si) => ctx.stops[si]!.priority))].sort((a, b) => b - a);
    for (const p of levels) groups.push(free.filter((si) => ctx.stops[si]!.priority === p));
  } else groups.push(free);
  for (const g of groups) s.unplanned.push(...regretInsert(ctx, s.routes, s.costs, g));
}

/** Drops position-locked stops that ended short of their position (the route had too few stops before them). */
function enforcePositions(ctx: Ctx, s: State): void {
  ctx.relaxPositions = false;
  for (let vi = 0; vi < s.routes.length; vi++) {
    while (simulate(ctx, vi, s.routes[vi]!) === Infinity) {
      const seq = s.routes[vi]!;
      let k = seq.findIndex(
        (si, i) => ctx.stops[si]!.lock?.position !== undefined && ctx.stops[si]!.lock.position !== i,
      );
      if (k < 0) k = seq.length - 1;
      s.unplanned.push(seq[k]!);
      seq.splice(k, 1);
    }
    s.costs[vi] = simulate(ctx, vi, s.routes[vi]!);
  }
}

function localSearch(ctx: Ctx, s: State, nbrs: number[][], stopAt: () => boolean, dirty?: number[]): void {
  for (let round = 0; round < 50 && !stopAt(); round++) {
    let improved = twoOpt(ctx, s.routes, s.costs, nbrs, stopAt, dirty);
    improved = orOpt(ctx, s.routes, s.costs, nbrs, stopAt, dirty) || improved;
    if (s.routes.length > 1) improved = interRoute(ctx, s.routes, s.costs, stopAt) || improved;
    if (s.unplanned.length > 0) {
      const before = s.unplanned.length;
      s.unplanned = regretInsert(ctx, s.routes, s.costs, s.unplanned);
      improved = improved || s.unplanned.length < before;
    }
    if (!improved) return;
  }
}

/** Ruin a cluster of nearby free stops and recreate it by regret insertion. */
function ruinRecreate(ctx: Ctx, s: State, nbrs: number[][], rand: () => number): { next: State; touched: number[] } {
  const next = copy(s);
  const n = ctx.stops.length;
  const seed = Math.floor(rand() * n);
  const size = Math.max(2, Math.min(n, Math.floor(n * (0.05 + 0.15 * rand()))));
  const victims = new Set([seed, ...nbrs[seed]!.slice(0, size - 1)].filter((si) => !ctx.stops[si]!.lock));
  for (let vi = 0; vi < next.routes.length; vi++) {
    const kept = next.routes[vi]!.filter((si) => !victims.has(si));
    if (kept.length !== next.routes[vi]!.length) {
      const c = simulate(ctx, vi, kept);
      if (c === Infinity) return { next: s, touched: [] };
      next.routes[vi] = kept;
      next.costs[vi] = c;
    }
  }
  const removed = [...victims].filter((si) => !next.unplanned.includes(si));
  next.unplanned = regretInsert(ctx, next.routes, next.costs, [...next.unplanned, ...removed]);
  const touched = new Set<number>();
  for (const si of victims) [si, ...nbrs[si]!].forEach((x) => touched.add(x));
  return { next, touched: [...touched] };
}

/** Double-bridge kick on a random route without position locks; falls back to ruin-and-recreate when infeasible. */
function kick(ctx: Ctx, s: State, nbrs: number[][], rand: () => number): { next: State; touched: number[] } {
  const vi = Math.floor(rand() * s.routes.length);
  const seq = s.routes[vi]!;
  const moved = seq.some((si) => ctx.stops[si]!.lock?.position !== undefined) ? null : doubleBridge(seq, rand);
  const c = moved ? simulate(ctx, vi, moved) : Infinity;
  if (!moved || c === Infinity) return ruinRecreate(ctx, s, nbrs, rand);
  const next = copy(s);
  next.routes[vi] = moved;
  next.costs[vi] = c;
  // Only the ends of the four new edges need looking at again.
  const edges = new Set(seq.slice(1).map((si, k) => `${seq[k]}-${si}`));
  const touched = new Set<number>();
  for (let k = 1; k < moved.length; k++) {
    if (!edges.has(`${moved[k - 1]}-${moved[k]}`)) touched.add(moved[k - 1]!).add(moved[k]!);
  }
  return { next, touched: [...touched] };
}

export function solve(input: SolverInput): Solution {
  const arc =
    input.objective === 'time'
      ? (a: number, b: number) => input.matrix.minutes(a, b)
      : (a: number, b: number) => input.matrix.distance(a, b);
  const ctx: Ctx = { input, stops: input.stops, vehicles: [...input.vehicles], arc, relaxPositions: true, steps: 0 };
  const budget = Math.max(1, input.timeLimitMs) * STEPS_PER_MS;
  const deadline = Date.now() + Math.max(1, input.timeLimitMs) * WALL_FACTOR + WALL_SLACK_MS;
  const stopAt = (): boolean => ctx.steps > budget || Date.now() > deadline;
  const rand = mulberry32(input.seed);

  let state: State = { routes: ctx.vehicles.map(() => []), costs: ctx.vehicles.map(() => 0), unplanned: [] };
  construct(
    ctx,
    state,
    input.stops.map((_, i) => i),
  );
  enforcePositions(ctx, state);
  const nbrs = neighbourLists(ctx, 10);
  ctx.steps = 0; // the budget is for improving; construction always runs to the end
  localSearch(ctx, state, nbrs, stopAt);
  let best = copy(state);
  let bestKey = key(ctx, best);
  while (!stopAt() && input.stops.length > 1) {
    ctx.steps += 50 + input.stops.length; // a round's fixed cost, so tiny problems also end on steps
    const { next, touched } = rand() < 0.7 ? kick(ctx, best, nbrs, rand) : ruinRecreate(ctx, best, nbrs, rand);
    state = next;
    localSearch(ctx, state, nbrs, stopAt, touched);
    const k = key(ctx, state);
    if (better(k, bestKey)) {
      best = copy(state);
      bestKey = k;
    }
  }
  return toSolution(ctx, best);
}

function toSolution(ctx: Ctx, s: State): Solution {
  const routes: PlannedRoute[] = [];
  s.routes.forEach((seq, vi) => {
    if (seq.length === 0) return;
    const out: Schedule = { visits: [], finish: 0, distance: 0, driveMinutes: 0, serviceMinutes: 0 };
    simulate(ctx, vi, seq, out);
    const v = ctx.vehicles[vi]!;
    routes.push({ vehicleId: v.id, departure: v.shiftStart, ...out });
  });
  const unplanned = [...s.unplanned]
    .sort((a, b) => a - b)
    .map((si) => ({ stopId: ctx.stops[si]!.id, reason: reasonFor(ctx, si, s.routes) }));
  return { routes, unplanned };
}
