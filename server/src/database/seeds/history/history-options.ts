/** How much past work the visit history invents, and how it is shaped. The demo and the report dataset differ here only. */
export interface HistoryScale {
  /** How far back the history goes from its last day. */
  years: number;
  /** Give a stop without any worked visit a history of its own (the demo keeps its never-visited stop unvisited). */
  visitUnvisitedStops: boolean;
  /** The chance each customer at the stop has shears done at a visit. */
  ticketChance: number;
  /** The chance each of their shears is on the ticket; replaced by what reaches targetLines when that is set. */
  lineChance: number;
  /** Aim for about this many ticket lines in all (the report dataset's 200,000). */
  targetLines?: number;
  /** A route day holds at most this many stops and this many expected bench minutes. */
  maxStopsPerDay: number;
  benchBudgetMinutes: number;
  /** A visit that comes one to three weeks past its cadence (so the cadence report has late visits). */
  lateVisitChance: number;
}

export interface HistoryOptions {
  /** The day the seed runs: the history ends the day before, or before any ticket or route day already there. */
  today: string;
  timeZone: string;
  seed: number;
  /** Only these stops get a history (the demo's own); null: every stop with coordinates. */
  stopIds: readonly string[] | null;
  scale: HistoryScale;
}

/** The demo's two years: about fifteen pairs a visit, as the registry's recent visits serviced. */
export const DEMO_HISTORY_SCALE: HistoryScale = {
  years: 2,
  visitUnvisitedStops: false,
  ticketChance: 0.85,
  lineChance: 0.75,
  maxStopsPerDay: 6,
  benchBudgetMinutes: 360,
  lateVisitChance: 0.1,
};
