/**
 * What would make a stop pay better for the drive: three changes a planner can make, each worked out from the stop's
 * own figures over the report's range. Pure arithmetic on figures the SQL has already added up.
 */

export interface StopDriveFigures {
  cadenceWeeks: number;
  visits: number;
  revenueCents: number;
  benchMinutes: number;
  driveMinutes: number;
}

export interface Neighbour {
  stopId: string;
  name: string;
  distanceKm: number;
  driveMinutes: number;
}

export type Suggestion =
  | {
      kind: 'longer-cadence';
      cadenceWeeks: number;
      newCadenceWeeks: number;
      driveMinutesSavedPerYear: number;
      perRouteHourCents: number;
    }
  | {
      kind: 'pair-with-neighbour';
      neighbourStopId: string;
      neighbourName: string;
      distanceKm: number;
      driveMinutesSavedPerVisit: number;
      perRouteHourCents: number;
    }
  | { kind: 'trip-charge'; tripChargeCents: number; perRouteHourCents: number };

/** The longest cadence a stop can have (the stops table allows up to 52 weeks). */
const MAX_CADENCE_WEEKS = 52;
const WEEKS_PER_YEAR = 52;

const perHour = (cents: number, minutes: number) => Math.round((cents * 60) / minutes);

/**
 * Visiting half as often: the same shears wait for the next visit, so a year's revenue and bench time stay, and the
 * drive to the stop happens half as many times. Assumes the customers keep the work for the longer gap.
 */
export function longerCadence(stop: StopDriveFigures): Suggestion | null {
  const newCadenceWeeks = stop.cadenceWeeks * 2;
  if (newCadenceWeeks > MAX_CADENCE_WEEKS || stop.visits === 0 || stop.driveMinutes <= 0) return null;
  const drivePerVisit = stop.driveMinutes / stop.visits;
  const visitsSavedPerYear = WEEKS_PER_YEAR / stop.cadenceWeeks - WEEKS_PER_YEAR / newCadenceWeeks;
  return {
    kind: 'longer-cadence',
    cadenceWeeks: stop.cadenceWeeks,
    newCadenceWeeks,
    driveMinutesSavedPerYear: Math.round(drivePerVisit * visitsSavedPerYear),
    perRouteHourCents: perHour(stop.revenueCents, stop.benchMinutes + stop.driveMinutes / 2),
  };
}

/** Working the stop on the same day as its nearest neighbour: its drive becomes the short hop from there. */
export function pairWithNeighbour(stop: StopDriveFigures, neighbour: Neighbour | null): Suggestion | null {
  if (!neighbour || stop.visits === 0) return null;
  const drivePerVisit = stop.driveMinutes / stop.visits;
  if (neighbour.driveMinutes >= drivePerVisit) return null;
  return {
    kind: 'pair-with-neighbour',
    neighbourStopId: neighbour.stopId,
    neighbourName: neighbour.name,
    distanceKm: neighbour.distanceKm,
    driveMinutesSavedPerVisit: Math.round((drivePerVisit - neighbour.driveMinutes) * 10) / 10,
    perRouteHourCents: perHour(stop.revenueCents, stop.benchMinutes + stop.visits * neighbour.driveMinutes),
  };
}

/**
 * The trip charge per visit that would bring the stop up to the median revenue per route hour, rounded up to whole
 * dollars (common practice: a trip charge is a round figure).
 */
export function tripCharge(stop: StopDriveFigures, medianPerRouteHourCents: number): Suggestion | null {
  const routeMinutes = stop.benchMinutes + stop.driveMinutes;
  if (stop.visits === 0 || routeMinutes <= 0) return null;
  const shortCents = (medianPerRouteHourCents * routeMinutes) / 60 - stop.revenueCents;
  if (shortCents <= 0) return null;
  const tripChargeCents = Math.ceil(shortCents / stop.visits / 100) * 100;
  return {
    kind: 'trip-charge',
    tripChargeCents,
    perRouteHourCents: perHour(stop.revenueCents + tripChargeCents * stop.visits, routeMinutes),
  };
}

/** Every change that would help, best result first. */
export function suggestionsFor(
  stop: StopDriveFigures,
  neighbour: Neighbour | null,
  medianPerRouteHourCents: number,
): Suggestion[] {
  return [longerCadence(stop), pairWithNeighbour(stop, neighbour), tripCharge(stop, medianPerRouteHourCents)]
    .filter((s): s is Suggestion => s !== null)
    .sort((a, b) => b.perRouteHourCents - a.perRouteHourCents);
}
