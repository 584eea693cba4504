import type { PlannedVisit, SolverInput, SolverStop, TimeWindow, Vehicle } from './types';

/** Shared, read-only facts of one solve plus a work counter (the deterministic budget). */
export interface Ctx {
  input: SolverInput;
  stops: SolverStop[];
  vehicles: Vehicle[];
  /** windows[vi][si]: the stop's windows on that vehicle's day, resolved once; [] = that vehicle cannot take it. */
  windows: (readonly TimeWindow[])[][];
  /** The objective's arc measure between two places. */
  arc: (from: number, to: number) => number;
  /** Added to every used route's cost, so moves that empty a route count the saving ('vehicles-then-distance'). */
  vehicleCost: number;
  /** closed[vi] = 1: insertion must not put stops on this vehicle (route elimination). */
  closed: Uint8Array;
  /**
   * loose[vi] = 1: no rule can bind on this vehicle (no lunch, room for every demand, windows open past any possible
   * arrival, symmetric arcs, no locks), so a move's arc delta is its exact cost change and needs no simulation.
   */
  loose: Uint8Array;
  /** Position locks are only "not beyond" while the routes are being built; strict afterwards. */
  relaxPositions: boolean;
  steps: number;
}

export function makeCtx(input: SolverInput, vehicleCost: number): Ctx {
  const arc =
    input.objective === 'time'
      ? (a: number, b: number) => input.matrix.minutes(a, b)
      : (a: number, b: number) => input.matrix.distance(a, b);
  const vehicles = [...input.vehicles];
  const windows = vehicles.map((v) => input.stops.map((s) => resolveWindows(s, v.id)));
  const loose = looseVehicles(input, vehicles, windows, arc);
  return {
    input,
    stops: input.stops,
    vehicles,
    windows,
    arc,
    vehicleCost,
    closed: new Uint8Array(vehicles.length),
    loose,
    relaxPositions: true,
    steps: 0,
  };
}

/** Which vehicles no rule can bind on: any order of any stops is feasible and costs exactly its arcs. */
function looseVehicles(
  input: SolverInput,
  vehicles: Vehicle[],
  windows: (readonly TimeWindow[])[][],
  arc: (a: number, b: number) => number,
): Uint8Array {
  const out = new Uint8Array(vehicles.length);
  const stops = input.stops;
  if (stops.some((s) => s.lock)) return out;
  const places = [...new Set([...stops.map((s) => s.place), ...vehicles.flatMap((v) => [v.startPlace, v.endPlace])])];
  let maxMinutes = 0;
  for (const a of places) {
    for (const b of places) {
      if (Math.abs(arc(a, b) - arc(b, a)) > 1e-9) return out;
      maxMinutes = Math.max(maxMinutes, input.matrix.minutes(a, b));
    }
  }
  const service = stops.reduce((sum, s) => sum + s.serviceMinutes, 0);
  const demand = stops.reduce((sum, s) => sum + (s.demand ?? 0), 0);
  vehicles.forEach((v, vi) => {
    const wins = windows[vi]!;
    const maxOpen = Math.max(v.shiftStart, ...wins.map((w) => (w.length > 0 ? w[w.length - 1]!.open : 0)));
    // Latest possible time anywhere on the route: wait for the latest opening, then serve and drive everything.
    const latest = maxOpen + service + (stops.length + 1) * maxMinutes;
    const ok =
      !v.lunch &&
      (v.capacity === undefined || v.capacity >= demand) &&
      v.latestFinish >= latest &&
      wins.every((w) => w.length > 0 && w[w.length - 1]!.close >= latest);
    out[vi] = ok ? 1 : 0;
  });
  return out;
}

/** A stop's windows for one vehicle: per-vehicle windows override the common ones; a vehicle left out gets none. */
export function resolveWindows(stop: SolverStop, vehicleId: string): readonly TimeWindow[] {
  const per = stop.vehicleWindows;
  if (!per) return stop.windows;
  return Object.prototype.hasOwnProperty.call(per, vehicleId) ? (per[vehicleId] ?? []) : [];
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
export function windowStart(windows: readonly TimeWindow[], arrival: number): number {
  for (const w of windows) if (arrival <= w.close) return Math.max(arrival, w.open);
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
  const wins = ctx.windows[vi]!;
  ctx.steps += seq.length + 1;
  if (seq.length === 0) return 0;
  let place = v.startPlace;
  let t = v.shiftStart;
  let cost = ctx.vehicleCost;
  let load = 0;
  let lunchPending = v.lunch !== undefined;
  for (let i = 0; i <= seq.length; i++) {
    const si = i < seq.length ? seq[i]! : -1;
    const stop = si >= 0 ? ctx.stops[si]! : undefined;
    if (lunchPending && v.lunch) {
      const l = v.lunch;
      let take = t >= l.earliest;
      if (!take && !stop) take = true;
      if (!take && stop) {
        const travel = m.minutes(place, stop.place);
        const s = windowStart(wins[si]!, t + travel);
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
      if (v.id !== lock.vehicleId) return Infinity;
      if (lock.position !== undefined && (ctx.relaxPositions ? i > lock.position : i !== lock.position))
        return Infinity;
    }
    const arrival = t + m.minutes(place, stop.place);
    const start = windowStart(wins[si]!, arrival);
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
