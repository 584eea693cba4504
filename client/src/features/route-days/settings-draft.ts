import { WEEKDAYS, type Weekday } from '@keenroute/shared';
import { parseTimeOfDay, timeOfDay } from './format';
import type { PlanningSettings } from './types';

/** The planning settings as the form edits them: times as "HH:MM" text, numbers possibly blank. */
export interface SettingsFormValues {
  baseLabel: string;
  baseLatitude: number | '';
  baseLongitude: number | '';
  workWeekdays: Weekday[];
  shiftStart: string;
  latestFinish: string;
  lunchEarliest: string;
  lunchLatest: string;
  lunchMinutes: number | '';
  circuity: number | '';
  averageSpeedKmh: number | '';
  noticeDays: number | '';
  solveSeconds: number | '';
}

// The same bounds as the API's: checked here first so the messages sit on the fields before anything is sent.
export const LIMITS = {
  circuity: [1, 2],
  averageSpeedKmh: [5, 130],
  noticeDays: [0, 28],
  lunchMinutes: [0, 180],
  solveSeconds: [1, 30],
} as const;

export function settingsToValues(settings: PlanningSettings): SettingsFormValues {
  return {
    ...settings,
    shiftStart: timeOfDay(settings.shiftStart),
    latestFinish: timeOfDay(settings.latestFinish),
    lunchEarliest: timeOfDay(settings.lunchEarliest),
    lunchLatest: timeOfDay(settings.lunchLatest),
  };
}

const num = (value: number | '') => (value === '' ? Number.NaN : value);

/** Only called on values that passed validation. */
export function valuesToSettings(values: SettingsFormValues): PlanningSettings {
  const time = (text: string) => parseTimeOfDay(text) ?? 0;
  return {
    baseLabel: values.baseLabel.trim(),
    baseLatitude: num(values.baseLatitude),
    baseLongitude: num(values.baseLongitude),
    workWeekdays: WEEKDAYS.filter((day) => values.workWeekdays.includes(day)),
    shiftStart: time(values.shiftStart),
    latestFinish: time(values.latestFinish),
    lunchEarliest: time(values.lunchEarliest),
    lunchLatest: time(values.lunchLatest),
    lunchMinutes: num(values.lunchMinutes),
    circuity: num(values.circuity),
    averageSpeedKmh: num(values.averageSpeedKmh),
    noticeDays: num(values.noticeDays),
    solveSeconds: num(values.solveSeconds),
  };
}

const timeRule = (what: string) => (value: string) =>
  parseTimeOfDay(value) === null ? `Enter the ${what} as HH:MM on a 24-hour clock, like 08:30.` : null;

function between(what: string, [low, high]: readonly [number, number], unit: string, whole = false) {
  return (value: number | '') => {
    if (value === '' || Number.isNaN(value)) return `Enter the ${what}.`;
    if (whole && !Number.isInteger(value)) return `The ${what} is a whole number.`;
    return value >= low && value <= high ? null : `The ${what} is from ${low} to ${high}${unit}.`;
  };
}

const later = (first: string, second: string, message: string) => (value: string, values: SettingsFormValues) => {
  const own = timeRule(second)(value);
  if (own) return own;
  const start = parseTimeOfDay(values[first as 'shiftStart']);
  const end = parseTimeOfDay(value);
  return start !== null && end !== null && end <= start ? message : null;
};

export const settingsRules = {
  baseLabel: (value: string) => (value.trim() ? null : 'Name the base, like "Workshop, 4 Anvil Lane".'),
  baseLatitude: (value: number | '') =>
    value === '' || Math.abs(value) > 90 ? 'The latitude is between -90 and 90.' : null,
  baseLongitude: (value: number | '') =>
    value === '' || Math.abs(value) > 180 ? 'The longitude is between -180 and 180.' : null,
  workWeekdays: (value: Weekday[]) => (value.length > 0 ? null : 'Choose at least one work day.'),
  shiftStart: timeRule('start of the day'),
  latestFinish: later('shiftStart', 'latest finish', 'The latest finish must be after the start of the day.'),
  lunchEarliest: timeRule('earliest lunch'),
  lunchLatest: later('lunchEarliest', 'latest lunch', 'The latest lunch must be after the earliest lunch.'),
  lunchMinutes: between('lunch break', LIMITS.lunchMinutes, ' minutes', true),
  circuity: between('road circuity', LIMITS.circuity, ' (road km per straight-line km)'),
  averageSpeedKmh: between('average speed', LIMITS.averageSpeedKmh, ' km/h', true),
  noticeDays: between('notice', LIMITS.noticeDays, ' days', true),
  solveSeconds: between('planning time', LIMITS.solveSeconds, ' seconds', true),
};
