import { windowStart, type Ctx } from './route-eval';
import type { TimeWindow } from './types';

/** Latest time inside the windows that is no later than `bound`, or -Infinity when none is. */
function latestStart(windows: readonly TimeWindow[], bound: number): number {
  for (let w = windows.length - 1; w >= 0; w--)
    if (windows[w]!.open <= bound) return Math.min(windows[w]!.close, bound);
  return -Infinity;
}

/**
 * A route's places and, where it is exact, its time slack, for O(1)-ish feasibility checks of moves. Indexes are
 * over the extended route [start, ...stops, end]: index k + 1 is the k-th stop.
 */
export interface RouteView {
  vi: number;
  place: Int32Array;
  /** leave[k]: when the vehicle leaves extended place k (k = 0..n) on the route as it is. */
  leave: Float64Array | null;
  /** latest[k]: latest service start at extended place k (1..n) that keeps the rest feasible; n + 1: at the end. */
  latest: Float64Array | null;
  /** loadBefore[k]: demand of the first k stops (k = 0..n). */
  loadBefore: Float64Array;
}

/**
 * The schedule up to a stop is the route's own (a prefix does not change when stops change after it), and the
 * backward latest starts tell whether a later arrival still fits. Exact without a lunch break or position locks, so
 * leave/latest are null in those cases and callers simulate.
 */
export function routeView(ctx: Ctx, vi: number, seq: readonly number[]): RouteView {
  const v = ctx.vehicles[vi]!;
  const n = seq.length;
  ctx.steps += n + 1;
  const place = new Int32Array(n + 2);
  const loadBefore = new Float64Array(n + 1);
  place[0] = v.startPlace;
  place[n + 1] = v.endPlace;
  for (let k = 0; k < n; k++) {
    const stop = ctx.stops[seq[k]!]!;
    place[k + 1] = stop.place;
    loadBefore[k + 1] = loadBefore[k]! + (stop.demand ?? 0);
  }
  const view: RouteView = { vi, place, leave: null, latest: null, loadBefore };
  if (v.lunch || seq.some((si) => ctx.stops[si]!.lock?.position !== undefined)) return view;
  const m = ctx.input.matrix;
  const wins = ctx.windows[vi]!;
  const leave = new Float64Array(n + 1);
  leave[0] = v.shiftStart;
  for (let k = 0; k < n; k++) {
    const stop = ctx.stops[seq[k]!]!;
    const start = windowStart(wins[seq[k]!]!, leave[k]! + m.minutes(place[k]!, stop.place));
    if (start < 0) return view;
    leave[k + 1] = start + stop.serviceMinutes;
  }
  const latest = new Float64Array(n + 2);
  latest[n + 1] = v.latestFinish;
  for (let k = n - 1; k >= 0; k--) {
    const stop = ctx.stops[seq[k]!]!;
    const bound = latest[k + 2]! - m.minutes(stop.place, place[k + 2]!) - stop.serviceMinutes;
    latest[k + 1] = latestStart(wins[seq[k]!]!, bound);
  }
  ctx.steps += 2 * (n + 1);
  view.leave = leave;
  view.latest = latest;
  return view;
}

/**
 * Whether vehicle `vi`, leaving extended place `from` of view `a` on time, can serve `middle` (stop indexes, in
 * order) and then reach extended place `to` of view `b` in time to go on as `b` does. `b` must be driven under the
 * same rules as vehicle vi (the same vehicle, or sameRules). Exact; null when a view has no slack data.
 */
export function joinFits(
  ctx: Ctx,
  vi: number,
  a: RouteView,
  from: number,
  middle: readonly number[],
  b: RouteView,
  to: number,
): boolean | null {
  if (!a.leave || !b.latest) return null;
  const m = ctx.input.matrix;
  const wins = ctx.windows[vi]!;
  let t = a.leave[from]!;
  let place = a.place[from]!;
  for (const si of middle) {
    const stop = ctx.stops[si]!;
    const start = windowStart(wins[si]!, t + m.minutes(place, stop.place));
    if (start < 0) return false;
    t = start + stop.serviceMinutes;
    place = stop.place;
  }
  ctx.steps += middle.length + 1;
  return t + m.minutes(place, b.place[to]!) <= b.latest[to]! + 1e-9;
}

/** Whether two vehicles drive a stop sequence under the same rules from some point on (end, finish, windows). */
export function sameRules(ctx: Ctx, va: number, vb: number): boolean {
  const a = ctx.vehicles[va]!;
  const b = ctx.vehicles[vb]!;
  return (
    a.endPlace === b.endPlace &&
    a.latestFinish === b.latestFinish &&
    a.capacity === b.capacity &&
    !a.lunch &&
    !b.lunch &&
    ctx.windows[va]!.every((w, si) => w === ctx.windows[vb]![si])
  );
}

/** Exact O(1) feasibility of putting stop si before the pos-th stop of the route; null if only simulation can tell. */
export function insertFits(ctx: Ctx, view: RouteView, si: number, pos: number): boolean | null {
  const cap = ctx.vehicles[view.vi]!.capacity;
  const n = view.loadBefore.length - 1;
  if (cap !== undefined && view.loadBefore[n]! + (ctx.stops[si]!.demand ?? 0) > cap) return false;
  return joinFits(ctx, view.vi, view, pos, [si], view, pos + 1);
}
