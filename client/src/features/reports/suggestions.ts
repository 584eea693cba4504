import { durationWords, money } from './format';
import type { DriveSuggestion } from './types';

function becomes(suggestion: DriveSuggestion): string {
  return `revenue per route hour becomes ${money(suggestion.perRouteHourCents)}`;
}

/**
 * A suggestion in plain words with its figures, as a planner would read it out: what to change, what it saves, and the
 * stop's revenue per route hour afterwards.
 */
export function suggestionWords(suggestion: DriveSuggestion): string {
  switch (suggestion.kind) {
    case 'longer-cadence':
      return (
        `Every ${suggestion.newCadenceWeeks} weeks instead of ${suggestion.cadenceWeeks}: saves about ` +
        `${durationWords(suggestion.driveMinutesSavedPerYear)} of driving a year; ${becomes(suggestion)}.`
      );
    case 'pair-with-neighbour':
      return (
        `Work it on the same route day as ${suggestion.neighbourName}, ${suggestion.distanceKm.toFixed(1)} km away: ` +
        `saves about ${durationWords(suggestion.driveMinutesSavedPerVisit)} of driving a visit; ${becomes(suggestion)}.`
      );
    case 'trip-charge':
      return `A trip charge of ${money(suggestion.tripChargeCents)} a visit: ${becomes(suggestion)}.`;
  }
}
