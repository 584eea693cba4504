/**
 * The route solver's vocabulary: a vehicle-routing problem with time windows. Times are minutes after midnight of
 * the route day; places are indexes into one travel matrix. Pure data: no Nest, no database.
 */

/** Travel between the places of one problem, by matrix index. */
export interface TravelMatrix {
  readonly size: number;
  /** Drive minutes from one place to another (need not be symmetric). */
  minutes(from: number, to: number): number;
  /** Road distance in the bench's own unit (km in the app; TSPLIB/Solomon units in the benchmark). */
  distance(from: number, to: number): number;
}

export interface TimeWindow {
  /** Earliest start of service. */
  open: number;
  /** Latest start of service. */
  close: number;
}

/** One sharpener's day: where and when it starts and must end. */
export interface Vehicle {
  id: string;
  startPlace: number;
  endPlace: number;
  /** Leaves the start place no earlier than this. */
  shiftStart: number;
  /** Back at the end place no later than this. */
  latestFinish: number;
  /** An optional break taken between stops: starts inside [earliest, latest], lasts `minutes`. */
  lunch?: { earliest: number; latest: number; minutes: number };
  /** Most demand the vehicle can carry (Solomon); unlimited when absent. */
  capacity?: number;
}

export interface SolverStop {
  id: string;
  place: number;
  /** Service may start inside any one of these (opening hours, or a booked window); sorted, not overlapping. */
  windows: TimeWindow[];
  /**
   * When present: the windows on each vehicle's day (a week plan has one vehicle per sharpener and day, and opening
   * hours differ by weekday). A vehicle left out, or given no windows, cannot take the stop. Overrides `windows`.
   */
  vehicleWindows?: Readonly<Record<string, TimeWindow[]>>;
  serviceMinutes: number;
  /** Higher goes first when not everything fits (overdue stops). */
  priority: number;
  demand?: number;
  /** Keep this stop on this vehicle, and optionally at this 0-based position in its route. */
  lock?: { vehicleId: string; position?: number };
}

export interface SolverInput {
  vehicles: Vehicle[];
  stops: SolverStop[];
  matrix: TravelMatrix;
  /** Budget for local search, counted in work steps calibrated to about this many ms (same answer on any machine). */
  timeLimitMs: number;
  /** Hard wall-clock cap; past it the best answer so far is returned (and runs may differ). Default 3x the limit. */
  maxWallMs?: number;
  /** Same seed and input, same answer. */
  seed: number;
  /**
   * What to minimise: 'distance' (benchmarks, TSP) or 'time' (the app: drive minutes). With 'vehicles-then-distance'
   * (Solomon) fewer vehicles used wins first.
   */
  objective: 'distance' | 'time' | 'vehicles-then-distance';
}

export interface PlannedVisit {
  stopId: string;
  arrival: number;
  /** Service start: the arrival, or the window's opening when early. */
  start: number;
  leave: number;
}

export interface PlannedRoute {
  vehicleId: string;
  visits: PlannedVisit[];
  /** When the lunch break starts, if the vehicle has one and the route is used. */
  lunchStart?: number;
  /** How many visits come before the break (taken at the place just left, before driving on); set with lunchStart. */
  lunchAfterVisits?: number;
  departure: number;
  finish: number;
  distance: number;
  driveMinutes: number;
  serviceMinutes: number;
}

export const UNPLANNED_REASONS = ['window-closed', 'day-too-long', 'capacity', 'lock-impossible'] as const;
export type UnplannedReason = (typeof UNPLANNED_REASONS)[number];

export interface Solution {
  routes: PlannedRoute[];
  /** Every stop of the input is either in a route or here, with why. */
  unplanned: { stopId: string; reason: UnplannedReason }[];
}
