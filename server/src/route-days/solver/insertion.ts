import { placeAt, simulate, windowStart, type Ctx } from './route-eval';
import type { UnplannedReason } from './types';

export interface Insertion {
  vi: number;
  pos: number;
  delta: number;
}

/** Cheapest feasible position for a stop in one route: candidates by arc delta, checked cheapest first. */
export function bestInRoute(ctx: Ctx, si: number, vi: number, seq: readonly number[], cost: number): Insertion | null {
  const stop = ctx.stops[si]!;
  if (stop.lock && stop.lock.vehicleId !== ctx.vehicles[vi]!.id) return null;
  const deltas = new Float64Array(seq.length + 1);
  for (let pos = 0; pos <= seq.length; pos++) {
    const a = placeAt(ctx, vi, seq, pos - 1);
    const b = placeAt(ctx, vi, seq, pos);
    deltas[pos] = ctx.arc(a, stop.place) + ctx.arc(stop.place, b) - (seq.length === 0 ? 0 : ctx.arc(a, b));
  }
  ctx.steps += seq.length + 1;
  // Cheapest unchecked position first; without tight windows the first one is usually feasible.
  for (let tries = 0; tries <= seq.length; tries++) {
    let pos = -1;
    for (let k = 0; k <= seq.length; k++) if (deltas[k]! < Infinity && (pos < 0 || deltas[k]! < deltas[pos]!)) pos = k;
    if (pos < 0) break;
    deltas[pos] = Infinity;
    const after = simulate(ctx, vi, [...seq.slice(0, pos), si, ...seq.slice(pos)]);
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
  const all = (si: number): (Insertion | null)[] => {
    let row = cache.get(si);
    if (!row) {
      row = routes.map((seq, vi) => bestInRoute(ctx, si, vi, seq, costs[vi]!));
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
    for (const [si, row] of cache) row[vi] = bestInRoute(ctx, si, vi, routes[vi]!, costs[vi]);
  }
  return [...left];
}

/** Why a stop fits nowhere: judged from trying it alone on each allowed vehicle, then against the current loads. */
export function reasonFor(ctx: Ctx, si: number, routes: number[][]): UnplannedReason {
  const stop = ctx.stops[si]!;
  const m = ctx.input.matrix;
  const allowed = ctx.vehicles
    .map((_, vi) => vi)
    .filter((vi) => !stop.lock || ctx.vehicles[vi]!.id === stop.lock.vehicleId);
  if (stop.lock) return 'lock-impossible';
  const reachable = allowed.some((vi) => {
    const v = ctx.vehicles[vi]!;
    return windowStart(stop, v.shiftStart + m.minutes(v.startPlace, stop.place)) >= 0;
  });
  if (!reachable) return 'window-closed';
  const aloneFits = allowed.filter((vi) => {
    const cap = ctx.vehicles[vi]!.capacity;
    const saved = ctx.vehicles[vi]!;
    ctx.vehicles[vi] = { ...saved, capacity: undefined };
    const ok = simulate(ctx, vi, [si]) < Infinity;
    ctx.vehicles[vi] = saved;
    return ok && (cap === undefined || cap >= 0);
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
