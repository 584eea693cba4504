import { UNPLANNED_REASONS, type PlannedRoute, type SolverInput, type SolverStop, type Solution } from './types';

const EPS = 1e-6;

/**
 * Independent feasibility check of a solution: recomputes every time from the matrix and reports each broken rule.
 * Written apart from the solver on purpose, so that a solver bug cannot hide itself. Empty list = fine.
 */
export function checkSolution(input: SolverInput, solution: Solution): string[] {
  const errors: string[] = [];
  const stops = new Map(input.stops.map((s) => [s.id, s]));
  const seen = new Map<string, number>();
  const count = (id: string): void => {
    seen.set(id, (seen.get(id) ?? 0) + 1);
  };
  for (const route of solution.routes) route.visits.forEach((v) => count(v.stopId));
  for (const u of solution.unplanned) {
    count(u.stopId);
    if (!(UNPLANNED_REASONS as readonly string[]).includes(u.reason))
      errors.push(`${u.stopId}: unknown reason ${u.reason}`);
  }
  for (const [id, n] of seen) {
    if (!stops.has(id)) errors.push(`${id}: not a stop of the input`);
    else if (n !== 1) errors.push(`${id}: appears ${n} times`);
  }
  for (const s of input.stops) if (!seen.has(s.id)) errors.push(`${s.id}: neither planned nor unplanned`);

  const vehiclesSeen = new Set<string>();
  for (const route of solution.routes) {
    if (vehiclesSeen.has(route.vehicleId)) errors.push(`${route.vehicleId}: more than one route`);
    vehiclesSeen.add(route.vehicleId);
    errors.push(...checkRoute(input, route, stops));
  }
  for (const s of input.stops) {
    if (!s.lock) continue;
    const route = solution.routes.find((r) => r.visits.some((v) => v.stopId === s.id));
    if (!route) continue;
    if (route.vehicleId !== s.lock.vehicleId)
      errors.push(`${s.id}: locked to ${s.lock.vehicleId}, on ${route.vehicleId}`);
    const at = route.visits.findIndex((v) => v.stopId === s.id);
    if (s.lock.position !== undefined && at !== s.lock.position) {
      errors.push(`${s.id}: locked at position ${s.lock.position}, at ${at}`);
    }
  }
  return errors;
}

/** The windows the stop offers this vehicle: its per-vehicle list when it has one (none if the vehicle is left out). */
function windowsOn(stop: SolverStop, vehicleId: string): readonly { open: number; close: number }[] {
  if (stop.vehicleWindows === undefined) return stop.windows;
  const entry = Object.entries(stop.vehicleWindows).find(([id]) => id === vehicleId);
  return entry ? entry[1] : [];
}

function near(a: number, b: number): boolean {
  return Math.abs(a - b) <= EPS * Math.max(1, Math.abs(a), Math.abs(b));
}

function checkRoute(input: SolverInput, route: PlannedRoute, stops: Map<string, SolverStop>): string[] {
  const errors: string[] = [];
  const vehicle = input.vehicles.find((v) => v.id === route.vehicleId);
  const tag = `route ${route.vehicleId}`;
  if (!vehicle) return [`${tag}: unknown vehicle`];
  const m = input.matrix;
  if (route.departure < vehicle.shiftStart - EPS) errors.push(`${tag}: departs before the shift starts`);
  const lunch = vehicle.lunch;
  if (lunch && route.visits.length > 0) {
    if (route.lunchStart === undefined || route.lunchAfterVisits === undefined) errors.push(`${tag}: no lunch break`);
    else if (route.lunchStart < lunch.earliest - EPS || route.lunchStart > lunch.latest + EPS) {
      errors.push(`${tag}: lunch at ${route.lunchStart} outside [${lunch.earliest}, ${lunch.latest}]`);
    }
  } else if (route.lunchStart !== undefined) errors.push(`${tag}: lunch without a lunch rule or visits`);

  let place = vehicle.startPlace;
  let t = route.departure;
  let distance = 0;
  let drive = 0;
  let service = 0;
  let load = 0;
  const takeLunchAfter = (done: number): void => {
    if (!lunch || route.lunchStart === undefined || route.lunchAfterVisits !== done) return;
    if (route.lunchStart < t - EPS) errors.push(`${tag}: lunch starts at ${route.lunchStart} before ${t}`);
    t = Math.max(t, route.lunchStart) + lunch.minutes;
  };
  route.visits.forEach((visit, i) => {
    takeLunchAfter(i);
    const stop = stops.get(visit.stopId);
    if (!stop) return;
    const arrival = t + m.minutes(place, stop.place);
    distance += m.distance(place, stop.place);
    drive += m.minutes(place, stop.place);
    if (!near(visit.arrival, arrival)) errors.push(`${stop.id}: arrival ${visit.arrival}, recomputed ${arrival}`);
    if (visit.start < arrival - EPS) errors.push(`${stop.id}: starts before arriving`);
    const windows = windowsOn(stop, vehicle.id);
    if (windows.length === 0) errors.push(`${stop.id}: no window on ${vehicle.id}'s day`);
    else if (!windows.some((w) => visit.start >= w.open - EPS && visit.start <= w.close + EPS)) {
      errors.push(`${stop.id}: start ${visit.start} outside every window on ${vehicle.id}'s day`);
    }
    if (!near(visit.leave, visit.start + stop.serviceMinutes)) errors.push(`${stop.id}: leave is not start + service`);
    service += stop.serviceMinutes;
    load += stop.demand ?? 0;
    t = visit.leave;
    place = stop.place;
  });
  if (route.visits.length > 0) takeLunchAfter(route.visits.length);
  const finish = t + m.minutes(place, vehicle.endPlace);
  distance += m.distance(place, vehicle.endPlace);
  drive += m.minutes(place, vehicle.endPlace);
  if (!near(route.finish, finish)) errors.push(`${tag}: finish ${route.finish}, recomputed ${finish}`);
  if (finish > vehicle.latestFinish + EPS) errors.push(`${tag}: finishes at ${finish} after ${vehicle.latestFinish}`);
  if (vehicle.capacity !== undefined && load > vehicle.capacity + EPS)
    errors.push(`${tag}: load ${load} over capacity`);
  if (!near(route.distance, distance)) errors.push(`${tag}: distance ${route.distance}, recomputed ${distance}`);
  if (!near(route.driveMinutes, drive)) errors.push(`${tag}: drive ${route.driveMinutes}, recomputed ${drive}`);
  if (!near(route.serviceMinutes, service))
    errors.push(`${tag}: service ${route.serviceMinutes}, recomputed ${service}`);
  return errors;
}
