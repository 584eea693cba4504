import { regretInsert, shuffledInsert } from './insertion';
import { simulate, type Ctx } from './route-eval';

/** Routes, their costs and the stops left out: one candidate answer. */
export interface State {
  routes: number[][];
  costs: number[];
  unplanned: number[];
}

export function copyState(s: State): State {
  return { routes: s.routes.map((r) => [...r]), costs: [...s.costs], unplanned: [...s.unplanned] };
}

/** A kicked state and the stops local search should look at again. */
export interface Kicked {
  next: State;
  touched: number[];
}

/** Local double bridge on one route (A B C D -> A C B D, B and C short): the classic kick 2-opt cannot undo. */
export function doubleBridge(seq: readonly number[], rand: () => number): number[] | null {
  const n = seq.length;
  if (n < 8) return null;
  const span = Math.max(2, Math.min(30, Math.floor(n / 3)));
  const p = 1 + Math.floor(rand() * (n - 3));
  const q = Math.min(n - 1, p + 1 + Math.floor(rand() * span));
  const r = Math.min(n, q + 1 + Math.floor(rand() * span));
  if (q >= r) return null;
  return [...seq.slice(0, p), ...seq.slice(q, r), ...seq.slice(p, q), ...seq.slice(r)];
}

/** Takes `victims` out of their routes; false (state untouched) if a route would become infeasible. */
function takeOut(ctx: Ctx, s: State, victims: Set<number>): boolean {
  const kept = s.routes.map((seq) => seq.filter((si) => !victims.has(si)));
  const costs = kept.map((seq, vi) => (seq.length === s.routes[vi]!.length ? s.costs[vi]! : simulate(ctx, vi, seq)));
  if (costs.some((c) => c === Infinity)) return false;
  s.routes = kept;
  s.costs = costs;
  return true;
}

function touchedBy(victims: Iterable<number>, nbrs: number[][]): number[] {
  const touched = new Set<number>();
  for (const si of victims) [si, ...nbrs[si]!].forEach((x) => touched.add(x));
  return [...touched];
}

/**
 * Ruin and recreate: removes nearby free stops, either a cluster (a stop and its nearest neighbours) or short strings
 * cut from the routes of its neighbours (slack for time windows), then puts them back by regret insertion.
 */
export function ruinRecreate(ctx: Ctx, s: State, nbrs: number[][], rand: () => number): Kicked {
  const next = copyState(s);
  const n = ctx.stops.length;
  const seed = Math.floor(rand() * n);
  const size = Math.max(2, Math.min(n, Math.floor(n * (0.05 + 0.15 * rand()))));
  const victims = new Set<number>();
  if (rand() < 0.5 || next.routes.length === 1) {
    [seed, ...nbrs[seed]!.slice(0, size - 1)].forEach((si) => victims.add(si));
  } else {
    const where = new Map<number, number>();
    next.routes.forEach((seq, vi) => seq.forEach((si, k) => where.set(si, vi * 1e6 + k)));
    const cut = new Set<number>();
    const maxLen = 1 + Math.floor(rand() * 6);
    for (const c of [seed, ...nbrs[seed]!]) {
      const at = where.get(c);
      if (at === undefined || victims.size >= size) continue;
      const vi = Math.floor(at / 1e6);
      if (cut.has(vi)) continue;
      cut.add(vi);
      const seq = next.routes[vi]!;
      const len = Math.min(seq.length, maxLen);
      const from = Math.max(0, Math.min(seq.length - len, (at % 1e6) - Math.floor(rand() * len)));
      seq.slice(from, from + len).forEach((si) => victims.add(si));
    }
  }
  for (const si of [...victims]) if (ctx.stops[si]!.lock) victims.delete(si);
  if (victims.size === 0 || !takeOut(ctx, next, victims)) return { next: s, touched: [] };
  const removed = [...victims].filter((si) => !next.unplanned.includes(si));
  const group = [...next.unplanned, ...removed];
  next.unplanned =
    rand() < 0.5
      ? shuffledInsert(ctx, next.routes, next.costs, group, rand)
      : regretInsert(ctx, next.routes, next.costs, group);
  return { next, touched: touchedBy(victims, nbrs) };
}

/** Double-bridge kick on a random route without position locks; falls back to ruin-and-recreate when infeasible. */
export function kick(ctx: Ctx, s: State, nbrs: number[][], rand: () => number): Kicked {
  const vi = Math.floor(rand() * s.routes.length);
  const seq = s.routes[vi]!;
  const moved = seq.some((si) => ctx.stops[si]!.lock?.position !== undefined) ? null : doubleBridge(seq, rand);
  const c = moved ? simulate(ctx, vi, moved) : Infinity;
  if (!moved || c === Infinity) return ruinRecreate(ctx, s, nbrs, rand);
  const next = copyState(s);
  next.routes[vi] = moved;
  next.costs[vi] = c;
  // Only the ends of the new edges need looking at again.
  const succ = new Map<number, number>();
  for (let k = 1; k < seq.length; k++) succ.set(seq[k - 1]!, seq[k]!);
  const touched = new Set<number>();
  for (let k = 1; k < moved.length; k++) {
    if (succ.get(moved[k - 1]!) !== moved[k]) touched.add(moved[k - 1]!).add(moved[k]!);
  }
  return { next, touched: [...touched] };
}

/**
 * Route elimination ('vehicles-then-distance'): empties one used route and puts its stops on the other used routes
 * (empty vehicles are closed, so nothing can move into a fresh one); stops that do not fit get a few rounds of
 * ruin-and-recreate around them. Null when some stop still does not fit; the victim route stays empty either way.
 */
export function eliminateRoute(
  ctx: Ctx,
  s: State,
  nbrs: number[][],
  rand: () => number,
  stopAt: () => boolean,
): Kicked | null {
  const used = s.routes.map((seq, vi) => vi).filter((vi) => s.routes[vi]!.length > 0);
  if (used.length < 2 || s.unplanned.length > 0) return null;
  const sizes = used.map((vi) => s.routes[vi]!.length);
  // Mostly the shortest route; sometimes any, so a stuck shortest one does not block the rest.
  const victim = rand() < 0.6 ? used[sizes.indexOf(Math.min(...sizes))]! : used[Math.floor(rand() * used.length)]!;
  const seqV = s.routes[victim]!;
  if (seqV.some((si) => ctx.stops[si]!.lock)) return null;
  const next = copyState(s);
  next.routes[victim] = [];
  next.costs[victim] = 0;
  next.routes.forEach((seq, vi) => (ctx.closed[vi] = seq.length === 0 ? 1 : 0));
  try {
    let left = regretInsert(ctx, next.routes, next.costs, seqV);
    for (let round = 0; round < 10 && left.length > 0 && !stopAt(); round++) {
      const around = new Set<number>();
      for (const si of left) nbrs[si]!.slice(0, 4 + Math.floor(rand() * 8)).forEach((x) => around.add(x));
      for (const si of left) around.delete(si);
      for (const si of [...around])
        if (ctx.stops[si]!.lock || !next.routes.some((r) => r.includes(si))) around.delete(si);
      if (!takeOut(ctx, next, around)) break;
      left = regretInsert(ctx, next.routes, next.costs, left);
      left.push(...regretInsert(ctx, next.routes, next.costs, [...around]));
    }
    // Guard: a refilled victim would make this loop forever trading stops in and out; count it as a failure.
    if (next.routes[victim].length > 0 || left.length > 0) return null;
    return { next, touched: touchedBy(seqV, nbrs) };
  } finally {
    ctx.closed.fill(0);
  }
}
