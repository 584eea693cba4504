import {
  DEFAULT_CADENCE_WEEKS,
  RuleError,
  TAX_RATE_MAX_BP,
  validateOpeningHours,
  WEEKDAYS,
  type BillingMode,
  type OpeningHours,
  type OpeningWindow,
  type StopKind,
  type Weekday,
} from '@keenroute/shared';
import type { StopDetail, StopInput } from './types';

export interface DayDraft {
  open: boolean;
  windows: OpeningWindow[];
}

export type OpeningHoursDraft = Record<Weekday, DayDraft>;

/** The stop form's values; number inputs hold '' while empty. */
export interface StopFormValues {
  name: string;
  kind: StopKind;
  street: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
  latitude: number | '';
  longitude: number | '';
  phone: string;
  email: string;
  openingHours: OpeningHoursDraft;
  closedDates: string[];
  cadenceWeeks: number | '';
  preferredWeekdays: Weekday[];
  billingMode: BillingMode;
  /** Entered as a percent with two decimals; stored as basis points. */
  taxPercent: number | '';
  accessParking: string;
  accessDoor: string;
  accessBestTime: string;
  assignedSharpenerId: string | null;
  /** The shop manager's client account: they see every customer and shear of the stop. */
  managerUserId: string | null;
  active: boolean;
}

export const DEFAULT_WINDOW: OpeningWindow = { opens: '09:00', closes: '17:00' };
export const TAX_PERCENT_MAX = TAX_RATE_MAX_BP / 100;

export function hoursToDraft(hours: OpeningHours): OpeningHoursDraft {
  const draft = {} as OpeningHoursDraft;
  for (const day of WEEKDAYS) {
    const windows = hours[day] ?? [];
    draft[day] = { open: windows.length > 0, windows: windows.map((window) => ({ ...window })) };
  }
  return draft;
}

/** Closed weekdays are left out, as the API reads them. */
export function draftToHours(draft: OpeningHoursDraft): OpeningHours {
  const hours: OpeningHours = {};
  for (const day of WEEKDAYS) {
    const { open, windows } = draft[day];
    if (open && windows.length > 0) hours[day] = windows.map(({ opens, closes }) => ({ opens, closes }));
  }
  return hours;
}

/** "Copy Monday to weekdays": Tuesday to Friday take Monday's hours. */
export function copyMondayToWeekdays(draft: OpeningHoursDraft): OpeningHoursDraft {
  const monday = draft.mon;
  const next = { ...draft };
  for (const day of ['tue', 'wed', 'thu', 'fri'] as const) {
    next[day] = { open: monday.open, windows: monday.windows.map((window) => ({ ...window })) };
  }
  return next;
}

/** The shared rule's message for one weekday's windows, or null when they are fine. */
export function dayProblem(day: Weekday, value: DayDraft): string | null {
  if (!value.open) return null;
  if (value.windows.length === 0) return 'Add an opening window, or mark the day closed.';
  try {
    validateOpeningHours({ [day]: value.windows });
    return null;
  } catch (error) {
    if (error instanceof RuleError) return error.message;
    throw error;
  }
}

export function percentToBp(percent: number): number {
  return Math.round(percent * 100);
}

export function bpToPercent(bp: number): number {
  return bp / 100;
}

export function emptyStopValues(): StopFormValues {
  return {
    name: '',
    kind: 'salon',
    street: '',
    city: '',
    region: '',
    postalCode: '',
    country: 'US',
    latitude: '',
    longitude: '',
    phone: '',
    email: '',
    openingHours: hoursToDraft({}),
    closedDates: [],
    cadenceWeeks: DEFAULT_CADENCE_WEEKS.salon,
    preferredWeekdays: [],
    billingMode: 'customer',
    taxPercent: 0,
    accessParking: '',
    accessDoor: '',
    accessBestTime: '',
    assignedSharpenerId: null,
    managerUserId: null,
    active: true,
  };
}

export function stopToValues(stop: StopDetail): StopFormValues {
  return {
    name: stop.name,
    kind: stop.kind,
    street: stop.street,
    city: stop.city,
    region: stop.region,
    postalCode: stop.postalCode,
    country: stop.country,
    latitude: stop.latitude ?? '',
    longitude: stop.longitude ?? '',
    phone: stop.phone ?? '',
    email: stop.email ?? '',
    openingHours: hoursToDraft(stop.openingHours),
    closedDates: [...stop.closedDates],
    cadenceWeeks: stop.cadenceWeeks,
    preferredWeekdays: [...stop.preferredWeekdays],
    billingMode: stop.billingMode,
    taxPercent: bpToPercent(stop.taxRateBp),
    accessParking: stop.accessParking,
    accessDoor: stop.accessDoor,
    accessBestTime: stop.accessBestTime,
    assignedSharpenerId: stop.assignedSharpener?.id ?? null,
    managerUserId: stop.manager?.id ?? null,
    active: stop.active,
  };
}

/** The address as one line for the geocoder. */
export function addressQuery(values: Pick<StopFormValues, 'street' | 'city' | 'region' | 'postalCode' | 'country'>) {
  const place = [values.region, values.postalCode]
    .map((part) => part.trim())
    .filter(Boolean)
    .join(' ');
  return [values.street, values.city, place, values.country]
    .map((part) => part.trim())
    .filter(Boolean)
    .join(', ');
}

interface InputOptions {
  /** The saved stop when editing: coordinates go only when the person changed them. */
  saved?: StopDetail;
  /** The pin came from the geocoder's candidates. */
  picked: boolean;
}

export function valuesToInput(values: StopFormValues, { saved, picked }: InputOptions): StopInput {
  const trimmed = (text: string) => text.trim();
  const input: StopInput = {
    name: trimmed(values.name),
    kind: values.kind,
    street: trimmed(values.street),
    city: trimmed(values.city),
    region: trimmed(values.region),
    postalCode: trimmed(values.postalCode),
    country: trimmed(values.country).toUpperCase() || 'US',
    phone: trimmed(values.phone) || null,
    email: trimmed(values.email) || null,
    openingHours: draftToHours(values.openingHours),
    closedDates: [...values.closedDates].sort(),
    cadenceWeeks: values.cadenceWeeks === '' ? DEFAULT_CADENCE_WEEKS[values.kind] : values.cadenceWeeks,
    preferredWeekdays: WEEKDAYS.filter((day) => values.preferredWeekdays.includes(day)),
    billingMode: values.billingMode,
    taxRateBp: values.taxPercent === '' ? 0 : percentToBp(values.taxPercent),
    accessParking: trimmed(values.accessParking),
    accessDoor: trimmed(values.accessDoor),
    accessBestTime: trimmed(values.accessBestTime),
    assignedSharpenerId: values.assignedSharpenerId,
    managerUserId: values.managerUserId,
    active: values.active,
  };
  const { latitude, longitude } = values;
  const changed = !saved || latitude !== (saved.latitude ?? '') || longitude !== (saved.longitude ?? '');
  // Unchanged coordinates stay out, so a changed address is geocoded again rather than kept at the old pin.
  if (latitude !== '' && longitude !== '' && changed) {
    input.latitude = latitude;
    input.longitude = longitude;
    if (picked) input.geocodeChoice = 'picked';
  } else if (latitude === '' && longitude === '' && saved?.latitude != null) {
    // Both cleared by hand on a stop that had a pin: the person means to take it away.
    input.latitude = null;
    input.longitude = null;
  }
  return input;
}

const SERVER_FIELD_ALIASES: Record<string, string> = {
  taxRateBp: 'taxPercent',
  geocodeChoice: 'latitude',
};

/** Where a server field error goes on the form: "openingHours.mon[0]" lands on Monday, "closedDates.2" on the dates. */
export function formPathOf(serverField: string): string {
  const [head = serverField, second] = serverField.split(/[.[\]]+/).filter(Boolean);
  if (head === 'openingHours' && second && (WEEKDAYS as readonly string[]).includes(second)) {
    return `openingHours.${second}`;
  }
  return SERVER_FIELD_ALIASES[head] ?? head;
}
