import type { PlannedVisit, SolverInput, SolverStop, Vehicle } from './types';

/** Shared, read-only facts of one solve plus a work counter (the deterministic budget). */
export interface Ctx {
  input: SolverInput;
  stops: SolverStop[];
  vehicles: Vehicle[];
  /** The objective's arc measure between two places. */
  arc: (from: number, to: number) => number;
  /** Position locks are only "not beyond" while the routes are being built; strict afterwards. */
  relaxPositions: boolean;
  steps: number;
}

export interface Schedule {
  visits: PlannedVisit[];
  lunchStart?: number;
  lunchAfterVisits?: number;
  finish: number;
  distance: number;
  driveMinutes: number;
  serviceMinutes: number;
}

/** Earliest service start inside a window at or after `arrival`, or -1 when every window has closed. */
export function windowStart(stop: SolverStop, arrival: number): number {
  for (const w of stop.windows) if (arrival <= w.close) return Math.max(arrival, w.open);
  return -1;
}

/**
 * Simulates one route (stop indexes) in O(n): returns its objective cost, or Infinity when any rule breaks.
 * Lunch rule: at each gap, take the break now if its window has opened; before it opens, take it now only if it fits
 * in the wait at the next stop or if going on first would end past the latest start; else go on.
 */
export function simulate(ctx: Ctx, vi: number, seq: readonly number[], out?: Schedule): number {
  const v = ctx.vehicles[vi]!;
  const m = ctx.input.matrix;
  ctx.steps += seq.length + 1;
  if (seq.length === 0) return 0;
  let place = v.startPlace;
  let t = v.shiftStart;
  let cost = 0;
  let load = 0;
  let lunchPending = v.lunch !== undefined && seq.length > 0;
  for (let i = 0; i <= seq.length; i++) {
    const stop = i < seq.length ? ctx.stops[seq[i]!]! : undefined;
    if (lunchPending && v.lunch) {
      const l = v.lunch;
      let take = t >= l.earliest;
      if (!take && !stop) take = true;
      if (!take && stop) {
        const travel = m.minutes(place, stop.place);
        const s = windowStart(stop, t + travel);
        if (s < 0) return Infinity;
        take = l.earliest + l.minutes + travel <= s || s + stop.serviceMinutes > l.latest;
      }
      if (take) {
        const at = Math.max(t, l.earliest);
        if (at > l.latest) return Infinity;
        if (out) {
          out.lunchStart = at;
          out.lunchAfterVisits = i;
        }
        t = at + l.minutes;
        lunchPending = false;
      }
    }
    if (!stop) break;
    const lock = stop.lock;
    if (lock) {
      if (ctx.vehicles[vi]!.id !== lock.vehicleId) return Infinity;
      if (lock.position !== undefined && (ctx.relaxPositions ? i > lock.position : i !== lock.position))
        return Infinity;
    }
    const arrival = t + m.minutes(place, stop.place);
    const start = windowStart(stop, arrival);
    if (start < 0) return Infinity;
    load += stop.demand ?? 0;
    if (v.capacity !== undefined && load > v.capacity) return Infinity;
    cost += ctx.arc(place, stop.place);
    if (out) {
      out.visits.push({ stopId: stop.id, arrival, start, leave: start + stop.serviceMinutes });
      out.distance += m.distance(place, stop.place);
      out.driveMinutes += m.minutes(place, stop.place);
      out.serviceMinutes += stop.serviceMinutes;
    }
    t = start + stop.serviceMinutes;
    place = stop.place;
  }
  const finish = t + m.minutes(place, v.endPlace);
  if (finish > v.latestFinish) return Infinity;
  cost += ctx.arc(place, v.endPlace);
  if (out) {
    out.finish = finish;
    out.distance += m.distance(place, v.endPlace);
    out.driveMinutes += m.minutes(place, v.endPlace);
  }
  return cost;
}

/** Place of a route's k-th element in the extended sequence [start, ...stops, end]. */
export function placeAt(ctx: Ctx, vi: number, seq: readonly number[], k: number): number {
  const v = ctx.vehicles[vi]!;
  if (k < 0) return v.startPlace;
  if (k >= seq.length) return v.endPlace;
  return ctx.stops[seq[k]!]!.place;
}
