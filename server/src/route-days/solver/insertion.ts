import { placeAt, simulate, windowStart, type Ctx } from './route-eval';
import { insertFits, routeView, type RouteView } from './slack';
import type { UnplannedReason } from './types';

export interface Insertion {
  vi: number;
  pos: number;
  delta: number;
}

/**
 * Cheapest feasible position for a stop in one route: by arc delta, checked in O(1) each through the route's view
 * where it can, else simulated cheapest first. `view` is the route's, when the caller keeps one.
 */
export function bestInRoute(
  ctx: Ctx,
  si: number,
  vi: number,
  seq: readonly number[],
  cost: number,
  view?: RouteView,
): Insertion | null {
  const stop = ctx.stops[si]!;
  if (ctx.closed[vi] || ctx.windows[vi]![si]!.length === 0) return null;
  if (stop.lock && stop.lock.vehicleId !== ctx.vehicles[vi]!.id) return null;
  const place = view?.place;
  const deltas = new Float64Array(seq.length + 1);
  for (let pos = 0; pos <= seq.length; pos++) {
    const a = place ? place[pos]! : placeAt(ctx, vi, seq, pos - 1);
    const b = place ? place[pos + 1]! : placeAt(ctx, vi, seq, pos);
    deltas[pos] = ctx.arc(a, stop.place) + ctx.arc(stop.place, b) - (seq.length === 0 ? 0 : ctx.arc(a, b));
  }
  ctx.steps += seq.length + 1;
  if (ctx.loose[vi]) {
    let pos = 0;
    for (let k = 1; k <= seq.length; k++) if (deltas[k]! < deltas[pos]!) pos = k;
    return { vi, pos, delta: deltas[pos]! + (seq.length === 0 ? ctx.vehicleCost : 0) };
  }
  const v = view ?? routeView(ctx, vi, seq);
  if (v.leave) {
    let pos = -1;
    for (let k = 0; k <= seq.length; k++) {
      if ((pos < 0 || deltas[k]! < deltas[pos]!) && insertFits(ctx, v, si, k)) pos = k;
    }
    return pos < 0 ? null : { vi, pos, delta: deltas[pos]! + (seq.length === 0 ? ctx.vehicleCost : 0) };
  }
  const trial = [...seq];
  // Cheapest unchecked position first; without tight windows the first one is usually feasible.
  for (let tries = 0; tries <= seq.length; tries++) {
    let pos = -1;
    for (let k = 0; k <= seq.length; k++) if (deltas[k]! < Infinity && (pos < 0 || deltas[k]! < deltas[pos]!)) pos = k;
    if (pos < 0) break;
    deltas[pos] = Infinity;
    trial.splice(pos, 0, si);
    const after = simulate(ctx, vi, trial);
    trial.splice(pos, 1);
    if (after < Infinity) return { vi, pos, delta: after - cost };
  }
  return null;
}

/**
 * Regret-2 insertion of `group` into the routes (mutated). Per-route best insertions are cached and only the route
 * that changed is recomputed. Returns the stops that fit nowhere.
 */
export function regretInsert(ctx: Ctx, routes: number[][], costs: number[], group: number[]): number[] {
  const left = new Set(group);
  const cache = new Map<number, (Insertion | null)[]>();
  const views = routes.map((seq, vi) => routeView(ctx, vi, seq));
  const all = (si: number): (Insertion | null)[] => {
    let row = cache.get(si);
    if (!row) {
      row = routes.map((seq, vi) => bestInRoute(ctx, si, vi, seq, costs[vi]!, views[vi]));
      cache.set(si, row);
    }
    return row;
  };
  while (left.size > 0) {
    let pick: { si: number; ins: Insertion; regret: number } | null = null;
    for (const si of left) {
      const row = all(si);
      let best: Insertion | null = null;
      let second = Infinity;
      for (const ins of row) {
        if (!ins) continue;
        if (!best || ins.delta < best.delta) {
          if (best) second = best.delta;
          best = ins;
        } else if (ins.delta < second) second = ins.delta;
      }
      if (!best) continue;
      const regret = second - best.delta;
      if (
        !pick ||
        regret > pick.regret ||
        (regret === pick.regret && (best.delta < pick.ins.delta || (best.delta === pick.ins.delta && si < pick.si)))
      ) {
        pick = { si, ins: best, regret };
      }
    }
    if (!pick) break;
    const { vi, pos } = pick.ins;
    routes[vi]!.splice(pos, 0, pick.si);
    costs[vi] = simulate(ctx, vi, routes[vi]!);
    left.delete(pick.si);
    cache.delete(pick.si);
    views[vi] = routeView(ctx, vi, routes[vi]!);
    for (const [si, row] of cache) row[vi] = bestInRoute(ctx, si, vi, routes[vi]!, costs[vi], views[vi]);
  }
  return [...left];
}

/**
 * Greedy insertion in a random order, each stop at its cheapest place (ranked with a little noise), for recreating
 * after a ruin: unlike regret insertion it does not rebuild the same routes every time. Returns the stops that fit
 * nowhere.
 */
export function shuffledInsert(
  ctx: Ctx,
  routes: number[][],
  costs: number[],
  group: number[],
  rand: () => number,
): number[] {
  const order = group.map((si) => ({ si, key: rand() })).sort((a, b) => a.key - b.key || a.si - b.si);
  const views: (RouteView | undefined)[] = routes.map(() => undefined);
  const left: number[] = [];
  for (const { si } of order) {
    let best: Insertion | null = null;
    let bestRank = Infinity;
    for (let vi = 0; vi < routes.length; vi++) {
      const view = (views[vi] ??= routeView(ctx, vi, routes[vi]!));
      const ins = bestInRoute(ctx, si, vi, routes[vi]!, costs[vi]!, view);
      const rank = ins ? ins.delta * (1 + 0.2 * rand()) : Infinity;
      if (ins && rank < bestRank) {
        best = ins;
        bestRank = rank;
      }
    }
    if (!best) {
      left.push(si);
      continue;
    }
    routes[best.vi]!.splice(best.pos, 0, si);
    costs[best.vi] = simulate(ctx, best.vi, routes[best.vi]!);
    views[best.vi] = undefined;
  }
  return left;
}

/**
 * Why a stop fits nowhere, judged on the vehicles it may use (its locked one, else all): no usable window, too long
 * even alone, or no room left in the loads. A lock to a missing vehicle or an unkeepable position is lock-impossible.
 */
export function reasonFor(ctx: Ctx, si: number, routes: number[][]): UnplannedReason {
  const stop = ctx.stops[si]!;
  const m = ctx.input.matrix;
  const all = ctx.vehicles.map((_, vi) => vi);
  const allowed = stop.lock ? all.filter((vi) => ctx.vehicles[vi]!.id === stop.lock!.vehicleId) : all;
  if (allowed.length === 0) return 'lock-impossible';
  const reachable = allowed.some((vi) => {
    const v = ctx.vehicles[vi]!;
    return windowStart(ctx.windows[vi]![si]!, v.shiftStart + m.minutes(v.startPlace, stop.place)) >= 0;
  });
  if (!reachable) return 'window-closed';
  if (stop.lock?.position !== undefined) return 'lock-impossible';
  const aloneFits = allowed.filter((vi) => {
    const saved = ctx.vehicles[vi]!;
    ctx.vehicles[vi] = { ...saved, capacity: undefined };
    const ok = simulate(ctx, vi, [si]) < Infinity;
    ctx.vehicles[vi] = saved;
    return ok;
  });
  if (aloneFits.length === 0) return 'day-too-long';
  const capOk = aloneFits.some((vi) => {
    const v = ctx.vehicles[vi]!;
    if (v.capacity === undefined) return true;
    const load = routes[vi]!.reduce((sum, x) => sum + (ctx.stops[x]!.demand ?? 0), 0);
    return load + (stop.demand ?? 0) <= v.capacity;
  });
  return capOk ? 'day-too-long' : 'capacity';
}
