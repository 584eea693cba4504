import { RouteIndex, StopQueue } from './route-index';
import { simulate, type Ctx } from './route-eval';
import { joinFits, routeView, type RouteView } from './slack';

/** The route's slack view, built when first asked for and dropped when the route changes. */
type Views = (vi: number) => RouteView;

export const EPS = 1e-9;

/** Replaces a route when the fully simulated candidate is cheaper; returns whether it did. */
export function tryRoute(ctx: Ctx, routes: number[][], costs: number[], vi: number, next: number[]): boolean {
  const c = simulate(ctx, vi, next);
  if (c < costs[vi]! - EPS) {
    routes[vi] = next;
    costs[vi] = c;
    return true;
  }
  return false;
}

/** The route with stops lo..hi taken out and put back (reversed or not) in the gap after original index k. */
export function moveSegment(seq: readonly number[], lo: number, hi: number, k: number, reverse: boolean): number[] {
  const seg = seq.slice(lo, hi + 1);
  if (reverse) seg.reverse();
  const out: number[] = k < 0 ? [...seg] : [];
  for (let t = 0; t < seq.length; t++) {
    if (t < lo || t > hi) out.push(seq[t]!);
    if (t === k) out.push(...seg);
  }
  return out;
}

/** 2-opt moves that create the edge a-c (the two segment reversals on its side); applies the first that pays. */
function twoOptAt(
  ctx: Ctx,
  routes: number[][],
  costs: number[],
  idx: RouteIndex,
  views: Views,
  a: number,
  c: number,
): boolean {
  const vi = idx.routeOf[a]!;
  const seq = routes[vi]!;
  const pl = idx.places[vi]!;
  const arc = ctx.arc;
  const i = idx.posOf[a]!;
  const j = idx.posOf[c]!;
  const lo = i < j ? i : j;
  const hi = i < j ? j : i;
  for (let variant = 0; variant < 2; variant++) {
    const x = variant === 0 ? lo + 1 : lo;
    const y = variant === 0 ? hi : hi - 1;
    if (x >= y) continue;
    ctx.steps++;
    const px = pl[x]!;
    const sx = pl[x + 1]!;
    const sy = pl[y + 1]!;
    const py = pl[y + 2]!;
    const delta = arc(px, sy) + arc(sx, py) - arc(px, sx) - arc(sy, py);
    if (delta >= -EPS) continue;
    if (ctx.loose[vi]) {
      for (let l = x, r = y; l < r; l++, r--) {
        const t = seq[l]!;
        seq[l] = seq[r]!;
        seq[r] = t;
      }
      costs[vi]! += delta;
      ctx.steps += y - x + 1;
      idx.reindexRange(routes, vi, x, y);
      return true;
    }
    const reversed = seq.slice(x, y + 1).reverse();
    if (joinFits(ctx, vi, views(vi), x, reversed, views(vi), y + 2) === false) continue;
    const next = [...seq.slice(0, x), ...reversed, ...seq.slice(y + 1)];
    if (tryRoute(ctx, routes, costs, vi, next)) {
      idx.reindex(routes, vi);
      return true;
    }
  }
  return false;
}

/** Or-opt removal gains of the five segments of 1-3 stops with `a` at one end (len 1; 2 and 3, a first or last). */
function segmentGains(ctx: Ctx, idx: RouteIndex, a: number, n: number, out: Float64Array): void {
  const pl = idx.places[idx.routeOf[a]!]!;
  const i = idx.posOf[a]!;
  for (let g = 0; g < 5; g++) {
    const len = (g + 3) >> 1;
    const lo = g === 0 || g % 2 === 1 ? i : i - len + 1;
    const hi = lo + len - 1;
    out[g] =
      lo < 0 || hi >= n
        ? NaN
        : ctx.arc(pl[lo]!, pl[lo + 1]!) + ctx.arc(pl[hi + 1]!, pl[hi + 2]!) - ctx.arc(pl[lo]!, pl[hi + 2]!);
  }
}

/** Whether the route's slack proves that moving seq[lo..hi] to the gap after k breaks a window. */
function slackRefuses(
  ctx: Ctx,
  vi: number,
  seq: readonly number[],
  view: RouteView,
  lo: number,
  hi: number,
  k: number,
  reverse: boolean,
): boolean {
  const seg = seq.slice(lo, hi + 1);
  if (reverse) seg.reverse();
  // Forward: the stops between the segment and the gap come first; backward: the segment comes first.
  const fits =
    k > hi
      ? joinFits(ctx, vi, view, lo, [...seq.slice(hi + 1, k + 1), ...seg], view, k + 2)
      : joinFits(ctx, vi, view, k + 1, [...seg, ...seq.slice(k + 1, lo)], view, hi + 2);
  return fits === false;
}

/**
 * Or-opt: moves a segment of 1-3 stops with `a` at one end (either way round) so that `a` lands next to `c`, in
 * the same route. Applies the first move that pays.
 */
function orOptAt(
  ctx: Ctx,
  routes: number[][],
  costs: number[],
  idx: RouteIndex,
  a: number,
  c: number,
  gains: Float64Array,
  views: Views,
): boolean {
  const vi = idx.routeOf[a]!;
  const seq = routes[vi]!;
  const pl = idx.places[vi]!;
  const arc = ctx.arc;
  const n = seq.length;
  const i = idx.posOf[a]!;
  const pc = idx.posOf[c]!;
  for (let g = 0; g < 5; g++) {
    const gain = gains[g]!;
    if (Number.isNaN(gain)) continue;
    const len = (g + 3) >> 1;
    const aFirst = g === 0 || g % 2 === 1;
    const lo = aFirst ? i : i - len + 1;
    const hi = lo + len - 1;
    if (pc >= lo && pc <= hi) continue;
    // Gap after c (a comes right after c) or before c (a comes right before c).
    for (let side = 0; side < 2; side++) {
      const k = side === 0 ? pc : pc - 1;
      if (k >= lo - 1 && k <= hi) continue;
      ctx.steps++;
      const reverse = (side === 0) !== aFirst;
      const first = reverse ? pl[hi + 1]! : pl[lo + 1]!;
      const last = reverse ? pl[lo + 1]! : pl[hi + 1]!;
      const delta = arc(pl[k + 1]!, first) + arc(last, pl[k + 2]!) - arc(pl[k + 1]!, pl[k + 2]!) - gain;
      if (delta >= -EPS) continue;
      if (!ctx.loose[vi] && slackRefuses(ctx, vi, seq, views(vi), lo, hi, k, reverse)) continue;
      const next = moveSegment(seq, lo, hi, k, reverse);
      ctx.steps += n;
      if (ctx.loose[vi]) {
        routes[vi] = next;
        costs[vi]! += delta;
      } else if (!tryRoute(ctx, routes, costs, vi, next)) continue;
      idx.reindex(routes, vi);
      return true;
    }
  }
  return false;
}

/**
 * 2-opt and Or-opt inside each route, driven by neighbour lists and don't-look bits: only stops near a change (or
 * the `dirty` ones given) are looked at again. Every candidate that pays by arcs is re-simulated before it is taken,
 * unless no rule can bind on that vehicle.
 */
export function intraRoute(
  ctx: Ctx,
  routes: number[][],
  costs: number[],
  nbrs: number[][],
  stopAt: () => boolean,
  dirty?: readonly number[],
): number[] {
  const idx = new RouteIndex(ctx, routes);
  const queue = new StopQueue(ctx.stops.length, dirty ?? routes.flat());
  const gains = new Float64Array(5);
  const cache: (RouteView | undefined)[] = routes.map(() => undefined);
  const views: Views = (vi) => (cache[vi] ??= routeView(ctx, vi, routes[vi]!));
  for (let a = queue.pop(); a !== undefined && !stopAt(); a = queue.pop()) {
    const vi = idx.routeOf[a]!;
    if (vi < 0) continue;
    segmentGains(ctx, idx, a, routes[vi]!.length, gains);
    for (const c of nbrs[a]!) {
      ctx.steps++;
      if (idx.routeOf[c] !== vi) continue;
      const before = routes[vi]!;
      const i = idx.posOf[a]!;
      const j = idx.posOf[c]!;
      const moved =
        twoOptAt(ctx, routes, costs, idx, views, a, c) || orOptAt(ctx, routes, costs, idx, a, c, gains, views);
      if (!moved) continue;
      cache[vi] = undefined;
      // Wake the stops around both old places of a and c; the moved stops' new neighbours too.
      for (let k = i - 3; k <= i + 3; k++) queue.push(before[k]);
      for (let k = j - 1; k <= j + 1; k++) queue.push(before[k]);
      const seq = routes[vi]!;
      for (const si of [a, c]) {
        const p = idx.posOf[si]!;
        queue.push(seq[p - 1]);
        queue.push(si);
        queue.push(seq[p + 1]);
      }
      break;
    }
  }
  return [...queue.woken];
}
