/**
 * Keenroute's route solver: a small vehicle-routing solver with time windows (several windows per stop, per-vehicle
 * windows, lunch breaks, capacity, vehicle and position locks, priorities). No well-kept registry package does VRPTW
 * with these constraints for Node, so this one is ours.
 *
 * Shape: regret-2 construction (locked stops first; in the 'time' objective by priority, high to low), then local
 * search (2-opt and Or-opt inside routes; relocate, cross-exchange and 2-opt* between routes; all over neighbour lists
 * with don't-look bits), then an iterated local search: seeded kicks (double bridge, ruin-and-recreate) from the
 * current answer, accepted by record-to-record travel against the best; for 'vehicles-then-distance' also route
 * elimination, and fewer used vehicles ranks first.
 *
 * Determinism: the budget is counted in simulated route steps (timeLimitMs x STEPS_PER_MS), not in wall time, so the
 * same input and seed give the same answer. The wall clock (maxWallMs, default timeLimitMs x WALL_FACTOR +
 * WALL_SLACK_MS) only cuts in as a safety net on a slow machine; only then may answers differ between runs.
 */
import { regretInsert, reasonFor } from './insertion';
import { intraRoute } from './intra-route';
import { interRoute } from './inter-route';
import { copyState, eliminateRoute, kick, ruinRecreate, type State } from './kicks';
import { mulberry32 } from './rng';
import { makeCtx, simulate, type Ctx, type Schedule } from './route-eval';
import type { PlannedRoute, Solution, SolverInput } from './types';

const STEPS_PER_MS = 2000;
const WALL_FACTOR = 3;
/** Fixed slack on the wall clock so a cold start (JIT warm-up) does not cut short small, quick solves. */
const WALL_SLACK_MS = 250;
/** Record-to-record travel: a kicked answer is kept while within this fraction of the best (shrinking to 0). */
const ACCEPT_START = 0.01;
/** Per used vehicle in 'vehicles-then-distance': far above any route's distance, so moves that empty a route pay. */
const VEHICLE_COST = 1e7;

function used(s: State): number {
  return s.routes.filter((r) => r.length > 0).length;
}

/** The objective's own cost of a state, without the per-vehicle charge. */
function distanceOf(ctx: Ctx, s: State): number {
  return s.costs.reduce((a, b) => a + b, 0) - ctx.vehicleCost * used(s);
}

/**
 * Lexicographic rank, cost last. 'time' (the app): unplanned stops counted per priority level, highest level first, so
 * one overdue stop outranks any number of lower ones; otherwise fewest unplanned, then (Solomon) fewest vehicles.
 */
function key(ctx: Ctx, s: State, levels: readonly number[]): number[] {
  const cost = distanceOf(ctx, s);
  if (ctx.input.objective === 'time') {
    return [...levels.map((p) => s.unplanned.filter((si) => ctx.stops[si]!.priority === p).length), cost];
  }
  return [s.unplanned.length, ctx.input.objective === 'vehicles-then-distance' ? used(s) : 0, cost];
}

/** -1 when a ranks before b, 1 after, 0 equal; `upTo` compares only the first entries. */
function compare(a: number[], b: number[], upTo = a.length): number {
  for (let i = 0; i < upTo; i++) {
    if (a[i]! < b[i]! - 1e-9) return -1;
    if (a[i]! > b[i]! + 1e-9) return 1;
  }
  return 0;
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

/** Each stop's ~k nearest other stops by the objective's arc measure (both ways). */
function neighbourLists(ctx: Ctx, k: number): number[][] {
  const n = ctx.stops.length;
  return ctx.stops.map((s, i) => {
    const others: number[] = [];
    for (let j = 0; j < n; j++) if (j !== i) others.push(j);
    const d = others.map((j) => ctx.arc(s.place, ctx.stops[j]!.place) + ctx.arc(ctx.stops[j]!.place, s.place));
    const order = others.map((_, x) => x).sort((a, b) => d[a]! - d[b]! || a - b);
    return order.slice(0, k).map((x) => others[x]!);
  });
}

/** Local search to a local optimum: looks at `dirty` (default: all) and then only at stops near a change. */
function localSearch(ctx: Ctx, s: State, nbrs: number[][], stopAt: () => boolean, dirty?: number[]): void {
  let look = dirty;
  for (let round = 0; round < 50 && !stopAt(); round++) {
    const near = new Set([...(look ?? []), ...intraRoute(ctx, s.routes, s.costs, nbrs, stopAt, look)]);
    const changed = s.routes.length > 1 ? interRoute(ctx, s.routes, s.costs, nbrs, stopAt, look && [...near]) : [];
    let inserted = false;
    if (s.unplanned.length > 0) {
      const count = s.unplanned.length;
      const left = regretInsert(ctx, s.routes, s.costs, s.unplanned);
      inserted = left.length < count;
      changed.push(...s.unplanned.filter((si) => !left.includes(si)));
      s.unplanned = left;
    }
    if (changed.length === 0 && !inserted) return;
    look = changed;
  }
}

export function solve(input: SolverInput): Solution {
  const ctx = makeCtx(input, input.objective === 'vehicles-then-distance' ? VEHICLE_COST : 0);
  const limit = Math.max(1, input.timeLimitMs);
  const budget = limit * STEPS_PER_MS;
  const deadline = Date.now() + (input.maxWallMs ?? limit * WALL_FACTOR + WALL_SLACK_MS);
  const stopAt = (): boolean => ctx.steps > budget || Date.now() > deadline;
  const rand = mulberry32(input.seed);

  let current: State = { routes: ctx.vehicles.map(() => []), costs: ctx.vehicles.map(() => 0), unplanned: [] };
  construct(
    ctx,
    current,
    input.stops.map((_, i) => i),
  );
  enforcePositions(ctx, current);
  const nbrs = neighbourLists(ctx, Math.min(12, Math.max(0, input.stops.length - 1)));
  ctx.steps = 0; // the budget is for improving; construction always runs to the end
  localSearch(ctx, current, nbrs, stopAt);
  const levels = [...new Set(input.stops.map((st) => st.priority))].sort((a, b) => b - a);
  const rank = (st: State): number[] => key(ctx, st, levels);
  let best = copyState(current);
  let bestKey = rank(best);
  let curKey = bestKey;
  const eliminating = input.objective === 'vehicles-then-distance';
  let gap = 4;
  let nextElimination = 0;
  for (let round = 0; !stopAt() && input.stops.length > 1; round++) {
    ctx.steps += 50 + input.stops.length; // a round's fixed cost, so tiny problems also end on steps
    if (eliminating && round === nextElimination) {
      const fewer = eliminateRoute(ctx, best, nbrs, rand, stopAt);
      // Back off while the fleet will not shrink, so the distance search gets the time.
      gap = fewer ? 4 : Math.min(256, gap * 2);
      nextElimination = round + gap;
      if (fewer) {
        localSearch(ctx, fewer.next, nbrs, stopAt, fewer.touched);
        best = copyState(fewer.next);
        bestKey = rank(best);
        current = fewer.next;
        curKey = bestKey;
        continue;
      }
    }
    // Double bridge is the classic kick for one long route; ruin-and-recreate moves stops between routes.
    const bridge = rand() < (input.vehicles.length === 1 ? 0.9 : 0.3);
    const { next, touched } = bridge ? kick(ctx, current, nbrs, rand) : ruinRecreate(ctx, current, nbrs, rand);
    localSearch(ctx, next, nbrs, stopAt, touched);
    const k = rank(next);
    if (compare(k, bestKey) < 0) {
      best = copyState(next);
      bestKey = k;
    }
    // Record-to-record travel on the cost; never worse on the counts ranked before it.
    const last = k.length - 1;
    const threshold = bestKey[last]! * ACCEPT_START * Math.max(0, 1 - ctx.steps / budget);
    const counts = compare(k, curKey, last);
    if (counts < 0 || (counts === 0 && compare(k, bestKey, last) === 0 && k[last]! <= bestKey[last]! + threshold)) {
      current = next;
      curKey = k;
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
