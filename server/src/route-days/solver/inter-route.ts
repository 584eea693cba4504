import { EPS } from './intra-route';
import { RouteIndex, StopQueue } from './route-index';
import { placeAt, simulate, type Ctx } from './route-eval';
import { joinFits, routeView, sameRules, type RouteView } from './slack';

interface Pair {
  ra: number;
  rb: number;
  nextA: number[];
  nextB: number[];
}

/** Takes the two new routes when, fully simulated, they cost less than the old two together. */
function tryPair(ctx: Ctx, routes: number[][], costs: number[], m: Pair): boolean {
  const ca = simulate(ctx, m.ra, m.nextA);
  if (ca === Infinity) return false;
  const cb = simulate(ctx, m.rb, m.nextB);
  if (ca + cb >= costs[m.ra]! + costs[m.rb]! - EPS) return false;
  routes[m.ra] = m.nextA;
  routes[m.rb] = m.nextB;
  costs[m.ra] = ca;
  costs[m.rb] = cb;
  return true;
}

/**
 * Moves between two routes that put stop `a` (route ra, index i) next to stop `b` (route rb, index j):
 * relocate a segment of 1-3 stops, cross-exchange two segments of 1-3 stops (swap when both are one stop), and
 * 2-opt* (swap the route tails). Each is screened by its arc delta, then both routes are simulated.
 */
function betweenAt(
  ctx: Ctx,
  routes: number[][],
  costs: number[],
  idx: RouteIndex,
  view: (vi: number) => RouteView,
  loads: readonly number[],
  a: number,
  b: number,
): boolean {
  const ra = idx.routeOf[a]!;
  const rb = idx.routeOf[b]!;
  const capA = ctx.vehicles[ra]!.capacity ?? Infinity;
  const capB = ctx.vehicles[rb]!.capacity ?? Infinity;
  const loadA = loads[ra]!;
  const loadB = loads[rb]!;
  const demand = (seg: readonly number[]): number => seg.reduce((sum, si) => sum + (ctx.stops[si]!.demand ?? 0), 0);
  // false only when the slack proves the move infeasible; unknown (null) is left to simulation.
  const maybe = (...checks: (boolean | null)[]): boolean => !checks.includes(false);
  const A = routes[ra]!;
  const B = routes[rb]!;
  const i = idx.posOf[a]!;
  const j = idx.posOf[b]!;
  const PA = (t: number): number => placeAt(ctx, ra, A, t);
  const PB = (t: number): number => placeAt(ctx, rb, B, t);
  const arc = ctx.arc;
  // Segment A[lo..hi] ends at a; `after` = it goes right after b (a first), else right before b (a last).
  for (const after of [true, false]) {
    for (let la = 1; la <= 3; la++) {
      const lo = after ? i : i - la + 1;
      const hi = lo + la - 1;
      if (lo < 0 || hi >= A.length) break;
      // The segment keeps its order: a is first when it goes after b and last when it goes before b.
      const segA = A.slice(lo, hi + 1);
      const fa = PA(lo);
      const ta = PA(hi);
      const emptiesA = la === A.length ? ctx.vehicleCost : 0;
      const outA = arc(PA(lo - 1), PA(lo)) + arc(PA(hi), PA(hi + 1));
      // Relocate: the segment goes into B next to b, nothing comes back.
      {
        ctx.steps++;
        const [x, y] = after ? [PB(j), PB(j + 1)] : [PB(j - 1), PB(j)];
        const gapB = after ? j : j - 1;
        const delta = arc(x, fa) + arc(ta, y) - arc(x, y) + arc(PA(lo - 1), PA(hi + 1)) - outA - emptiesA;
        if (
          delta < -EPS &&
          loadB + demand(segA) <= capB &&
          maybe(
            joinFits(ctx, ra, view(ra), lo, [], view(ra), hi + 2),
            joinFits(ctx, rb, view(rb), gapB + 1, segA, view(rb), gapB + 2),
          )
        ) {
          const nextA = [...A.slice(0, lo), ...A.slice(hi + 1)];
          const nextB = [...B.slice(0, gapB + 1), ...segA, ...B.slice(gapB + 1)];
          if (tryPair(ctx, routes, costs, { ra, rb, nextA, nextB })) return true;
        }
      }
      // Cross-exchange: the segment replaces 1-3 stops of B beside b, which go where the segment was.
      for (let lb = 1; lb <= 3; lb++) {
        const blo = after ? j + 1 : j - lb;
        const bhi = blo + lb - 1;
        if (blo < 0 || bhi >= B.length) break;
        ctx.steps++;
        const segB = B.slice(blo, bhi + 1);
        const fb = PB(blo);
        const tb = PB(bhi);
        const outB = arc(PB(blo - 1), PB(blo)) + arc(PB(bhi), PB(bhi + 1));
        // In B the segment of A takes [blo..bhi]; in A the segment of B takes [lo..hi]; both keep their order.
        const inB = arc(PB(blo - 1), fa) + arc(ta, PB(bhi + 1));
        const inA = arc(PA(lo - 1), fb) + arc(tb, PA(hi + 1));
        if (inA + inB - outA - outB >= -EPS) continue;
        const moved = demand(segB) - demand(segA);
        if (loadA + moved > capA || loadB - moved > capB) continue;
        const vA = view(ra);
        const vB = view(rb);
        if (!maybe(joinFits(ctx, ra, vA, lo, segB, vA, hi + 2), joinFits(ctx, rb, vB, blo, segA, vB, bhi + 2)))
          continue;
        const nextA = [...A.slice(0, lo), ...segB, ...A.slice(hi + 1)];
        const nextB = [...B.slice(0, blo), ...segA, ...B.slice(bhi + 1)];
        if (tryPair(ctx, routes, costs, { ra, rb, nextA, nextB })) return true;
      }
    }
  }
  // 2-opt*: A[..i] then B[j..] (edge a-b), and B[..j-1] then A[i+1..]; or B[..j] then A[i..] (edge b-a).
  for (const aLeads of [true, false]) {
    ctx.steps++;
    const [headA, tailB] = aLeads ? [i, j] : [i - 1, j + 1];
    const old = arc(PA(headA), PA(headA + 1)) + arc(PB(tailB - 1), PB(tailB));
    const nu = arc(PA(headA), PB(tailB)) + arc(PB(tailB - 1), PA(headA + 1));
    const emptyA = headA < 0 && tailB >= B.length;
    const emptyB = tailB === 0 && headA + 1 >= A.length;
    if (nu - old - (emptyA || emptyB ? ctx.vehicleCost : 0) >= -EPS) continue;
    const vA = view(ra);
    const vB = view(rb);
    const headLoadA = vA.loadBefore[headA + 1]!;
    const headLoadB = vB.loadBefore[tailB]!;
    if (headLoadA + loadB - headLoadB > capA || headLoadB + loadA - headLoadA > capB) continue;
    if (
      sameRules(ctx, ra, rb) &&
      !maybe(joinFits(ctx, ra, vA, headA + 1, [], vB, tailB + 1), joinFits(ctx, rb, vB, tailB, [], vA, headA + 2))
    )
      continue;
    const nextA = [...A.slice(0, headA + 1), ...B.slice(tailB)];
    const nextB = [...B.slice(0, tailB), ...A.slice(headA + 1)];
    if (tryPair(ctx, routes, costs, { ra, rb, nextA, nextB })) return true;
  }
  return false;
}

/** Relocate, cross-exchange and 2-opt* between routes, over neighbour lists with don't-look bits. */
export function interRoute(
  ctx: Ctx,
  routes: number[][],
  costs: number[],
  nbrs: number[][],
  stopAt: () => boolean,
  dirty?: readonly number[],
): number[] {
  const idx = new RouteIndex(ctx, routes);
  const queue = new StopQueue(ctx.stops.length, dirty ?? routes.flat());
  // Each stop's neighbours on its route before the move, to tell which stops a move touched.
  const prev = new Int32Array(ctx.stops.length);
  const next = new Int32Array(ctx.stops.length);
  const remember = (vi: number): void =>
    routes[vi]!.forEach((si, k, seq) => {
      prev[si] = k > 0 ? seq[k - 1]! : -1;
      next[si] = k + 1 < seq.length ? seq[k + 1]! : -1;
    });
  routes.forEach((_, vi) => remember(vi));
  const sameNeighbours = (si: number, p: number, q: number): boolean => prev[si] === p && next[si] === q;
  const views: (RouteView | undefined)[] = routes.map(() => undefined);
  const view = (vi: number): RouteView => (views[vi] ??= routeView(ctx, vi, routes[vi]!));
  const loadOf = (seq: readonly number[]): number => seq.reduce((sum, si) => sum + (ctx.stops[si]!.demand ?? 0), 0);
  const loads = routes.map(loadOf);
  for (let a = queue.pop(); a !== undefined && !stopAt(); a = queue.pop()) {
    const ra = idx.routeOf[a]!;
    if (ra < 0) continue;
    for (const b of nbrs[a]!) {
      ctx.steps++;
      const rb = idx.routeOf[b]!;
      if (rb < 0 || rb === ra) continue;
      if (!betweenAt(ctx, routes, costs, idx, view, loads, a, b)) continue;
      views[ra] = undefined;
      views[rb] = undefined;
      loads[ra] = loadOf(routes[ra]!);
      loads[rb] = loadOf(routes[rb]!);
      // The moves only trade stops between these two routes, so re-indexing both covers everyone.
      idx.reindex(routes, ra);
      idx.reindex(routes, rb);
      // Wake the stops whose neighbours changed: where the two routes now differ from before.
      for (const vi of [ra, rb]) {
        const seq = routes[vi]!;
        seq.forEach((si, k) => {
          if (!sameNeighbours(si, k > 0 ? seq[k - 1]! : -1, k + 1 < seq.length ? seq[k + 1]! : -1)) queue.push(si);
        });
      }
      remember(ra);
      remember(rb);
      break;
    }
  }
  return [...queue.woken];
}
