import { placeAt, simulate, type Ctx } from './route-eval';

const EPS = 1e-9;

/** Each stop's ~k nearest other stops by the objective's arc measure. */
export function neighbourLists(ctx: Ctx, k: number): number[][] {
  const n = ctx.stops.length;
  return ctx.stops.map((s, i) => {
    const others: number[] = [];
    for (let j = 0; j < n; j++) if (j !== i) others.push(j);
    const d = (j: number): number => ctx.arc(s.place, ctx.stops[j]!.place) + ctx.arc(ctx.stops[j]!.place, s.place);
    others.sort((a, b) => d(a) - d(b) || a - b);
    return others.slice(0, k);
  });
}

/** Replaces a route when the fully simulated candidate is cheaper; returns whether it did. */
function tryRoute(ctx: Ctx, routes: number[][], costs: number[], vi: number, next: number[]): boolean {
  const c = simulate(ctx, vi, next);
  if (c < costs[vi]! - EPS) {
    routes[vi] = next;
    costs[vi] = c;
    return true;
  }
  return false;
}

/**
 * 2-opt inside each route, driven by neighbour lists and don't-look bits: only stops at the ends of changed edges
 * (or the `dirty` ones given) are looked at again. Every candidate is re-simulated before it is taken.
 */
export function twoOpt(
  ctx: Ctx,
  routes: number[][],
  costs: number[],
  nbrs: number[][],
  stopAt: () => boolean,
  dirty?: readonly number[],
): boolean {
  let any = false;
  const n = ctx.stops.length;
  const pos = new Int32Array(n).fill(-1);
  const queued = new Uint8Array(n);
  for (let vi = 0; vi < routes.length; vi++) {
    const index = (): void => routes[vi]!.forEach((si, k) => (pos[si] = k));
    index();
    const mine = (si: number): boolean => pos[si]! >= 0 && routes[vi]![pos[si]!] === si;
    const queue: number[] = (dirty ?? routes[vi]!).filter(mine);
    queue.forEach((si) => (queued[si] = 1));
    const push = (k: number): void => {
      const si = routes[vi]![k];
      if (si !== undefined && !queued[si]) {
        queued[si] = 1;
        queue.push(si);
      }
    };
    for (let head = 0; head < queue.length && !stopAt(); head++) {
      const a = queue[head]!;
      queued[a] = 0;
      const seq = routes[vi]!;
      const i = pos[a]!;
      for (const c of nbrs[a]!) {
        ctx.steps++;
        if (!mine(c)) continue;
        const j = pos[c]!;
        // The four segment reversals that create the edge a-c (two on each side).
        const segs: [number, number][] =
          j > i
            ? [
                [i + 1, j],
                [i, j - 1],
              ]
            : [
                [j, i - 1],
                [j + 1, i],
              ];
        let next: number[] | null = null;
        let ends: number[] = [];
        for (const [x, y] of segs) {
          if (x >= y) continue;
          const px = placeAt(ctx, vi, seq, x - 1);
          const py = placeAt(ctx, vi, seq, y + 1);
          const delta =
            ctx.arc(px, placeAt(ctx, vi, seq, y)) +
            ctx.arc(placeAt(ctx, vi, seq, x), py) -
            ctx.arc(px, placeAt(ctx, vi, seq, x)) -
            ctx.arc(placeAt(ctx, vi, seq, y), py);
          if (delta < -EPS) {
            next = [...seq.slice(0, x), ...seq.slice(x, y + 1).reverse(), ...seq.slice(y + 1)];
            ends = [x - 1, x, y, y + 1];
            break;
          }
        }
        if (next && tryRoute(ctx, routes, costs, vi, next)) {
          any = true;
          index();
          ends.forEach(push);
          push(pos[a]!);
          break;
        }
      }
    }
    queue.forEach((si) => (queued[si] = 0));
  }
  return any;
}

/** Or-opt: move a segment of 1-3 stops (either way round) next to a neighbour of its ends, in its own route. */
export function orOpt(
  ctx: Ctx,
  routes: number[][],
  costs: number[],
  nbrs: number[][],
  stopAt: () => boolean,
  dirty?: readonly number[],
): boolean {
  let any = false;
  for (let vi = 0; vi < routes.length; vi++) {
    const starts = dirty ? dirty.filter((si) => routes[vi]!.includes(si)) : [...routes[vi]!];
    for (const a of starts) {
      for (let len = 1; len <= 3 && !stopAt(); len++) {
        const seq = routes[vi]!;
        const i = seq.indexOf(a);
        if (i < 0 || i + len > seq.length) break;
        const seg = seq.slice(i, i + len);
        const rest = [...seq.slice(0, i), ...seq.slice(i + len)];
        const gain =
          ctx.arc(placeAt(ctx, vi, seq, i - 1), placeAt(ctx, vi, seq, i)) +
          ctx.arc(placeAt(ctx, vi, seq, i + len - 1), placeAt(ctx, vi, seq, i + len)) -
          ctx.arc(placeAt(ctx, vi, seq, i - 1), placeAt(ctx, vi, seq, i + len));
        const spots = new Set<number>();
        const pos = new Map(rest.map((x, k) => [x, k]));
        for (const c of [...nbrs[seg[0]!]!, ...nbrs[seg[len - 1]!]!]) {
          const k = pos.get(c);
          if (k !== undefined) spots.add(k).add(k + 1);
        }
        ctx.steps += rest.length;
        let done = false;
        for (const k of [...spots].sort((x, y) => x - y)) {
          const pa = placeAt(ctx, vi, rest, k - 1);
          const pb = placeAt(ctx, vi, rest, k);
          for (const flip of [false, true]) {
            ctx.steps++;
            const s2 = flip ? [...seg].reverse() : seg;
            const first = ctx.stops[s2[0]!]!.place;
            const last = ctx.stops[s2[len - 1]!]!.place;
            if (ctx.arc(pa, first) + ctx.arc(last, pb) - ctx.arc(pa, pb) - gain >= -EPS) continue;
            if (tryRoute(ctx, routes, costs, vi, [...rest.slice(0, k), ...s2, ...rest.slice(k)])) {
              done = any = true;
              break;
            }
          }
          if (done) break;
        }
      }
    }
  }
  return any;
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

/** Relocate one stop to another route, or exchange two stops between routes (locked stops stay put). */
export function interRoute(ctx: Ctx, routes: number[][], costs: number[], stopAt: () => boolean): boolean {
  let any = false;
  const r = routes.length;
  for (let va = 0; va < r; va++) {
    for (let vb = 0; vb < r; vb++) {
      if (va === vb) continue;
      for (let i = 0; i < routes[va]!.length && !stopAt(); i++) {
        const s = routes[va]![i]!;
        if (ctx.stops[s]!.lock) continue;
        const restA = routes[va]!.filter((_, k) => k !== i);
        const costA = simulate(ctx, va, restA);
        if (costA === Infinity) continue;
        let moved = false;
        for (let k = 0; k <= routes[vb]!.length && !moved; k++) {
          const nextB = [...routes[vb]!.slice(0, k), s, ...routes[vb]!.slice(k)];
          const costB = simulate(ctx, vb, nextB);
          if (costA + costB < costs[va]! + costs[vb]! - EPS) {
            routes[va] = restA;
            routes[vb] = nextB;
            costs[va] = costA;
            costs[vb] = costB;
            moved = any = true;
          }
        }
        if (moved) {
          i--;
          continue;
        }
        for (let j = 0; j < routes[vb]!.length; j++) {
          const t = routes[vb]![j]!;
          if (ctx.stops[t]!.lock) continue;
          const nextA = routes[va]!.map((x) => (x === s ? t : x));
          const nextB = routes[vb]!.map((x) => (x === t ? s : x));
          const ca = simulate(ctx, va, nextA);
          if (ca === Infinity) continue;
          const cb = simulate(ctx, vb, nextB);
          if (ca + cb < costs[va]! + costs[vb]! - EPS) {
            routes[va] = nextA;
            routes[vb] = nextB;
            costs[va] = ca;
            costs[vb] = cb;
            any = true;
            break;
          }
        }
      }
    }
  }
  return any;
}
