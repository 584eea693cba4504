import {
  BILLING_MODES,
  DEFAULT_CADENCE_WEEKS,
  STOP_KINDS,
  validateCadence,
  validateTaxRateBp,
  type BillingMode,
  type StopKind,
} from '@keenroute/shared';
import type { CsvRecord } from '../import-kinds';
import { RowReader, type CellProblem, type RowRead } from './row-reader';

export const STOP_COLUMNS = [
  'name',
  'kind',
  'street',
  'city',
  'region',
  'postal_code',
  'country',
  'phone',
  'email',
  'cadence_weeks',
  'billing_mode',
  'tax_rate_bp',
  'latitude',
  'longitude',
  'access_parking',
  'access_door',
  'access_best_time',
] as const;
export const STOP_REQUIRED_COLUMNS = ['name', 'kind', 'street', 'city'] as const;

export interface StopDraft {
  name: string;
  kind: StopKind;
  street: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
  phone: string | null;
  email: string | null;
  cadenceWeeks: number;
  billingMode: BillingMode;
  taxRateBp: number;
  latitude: number | null;
  longitude: number | null;
  accessParking: string;
  accessDoor: string;
  accessBestTime: string;
}

/** The duplicate rule of stops_name_address_key: name, street, city and postal code, ignoring case. */
export function stopKey(stop: Pick<StopDraft, 'name' | 'street' | 'city' | 'postalCode'>): string {
  return [stop.name, stop.street, stop.city, stop.postalCode].map((part) => part.toLowerCase()).join('\u0000');
}

function coordinates(reader: RowReader): { latitude: number | null; longitude: number | null } {
  const latitude = reader.number('latitude');
  const longitude = reader.number('longitude');
  if ((latitude === null) !== (longitude === null)) {
    reader.problem(latitude === null ? 'latitude' : 'longitude', 'Give both latitude and longitude, or neither.');
  }
  if (latitude !== null && !Number.isNaN(latitude) && Math.abs(latitude) > 90) {
    reader.problem('latitude', `latitude is between -90 and 90; got ${latitude}.`);
  }
  if (longitude !== null && !Number.isNaN(longitude) && Math.abs(longitude) > 180) {
    reader.problem('longitude', `longitude is between -180 and 180; got ${longitude}.`);
  }
  return { latitude, longitude };
}

/** Checks one stop row on its own (no database): required cells, codes, numbers and lengths. */
export function readStopRow(record: CsvRecord): RowRead<StopDraft> {
  const reader = new RowReader(record);
  const name = reader.text('name', 120, true);
  const kind = reader.choice('kind', STOP_KINDS);
  const street = reader.text('street', 200, true);
  const city = reader.text('city', 100, true);
  const region = reader.text('region', 100);
  const postalCode = reader.text('postal_code', 20);
  const country = (reader.raw('country') || 'US').toUpperCase();
  if (!/^[A-Z]{2}$/.test(country)) reader.problem('country', `country is a two-letter code like US; got "${country}".`);
  const phone = reader.optionalText('phone', 40);
  const email = reader.email('email');
  const cadenceCell = reader.number('cadence_weeks');
  const cadenceWeeks =
    cadenceCell === null
      ? kind && DEFAULT_CADENCE_WEEKS[kind]
      : Number.isNaN(cadenceCell)
        ? undefined
        : reader.rule('cadence_weeks', () => validateCadence(cadenceCell, 'cadence_weeks'));
  const billingMode = reader.choice('billing_mode', BILLING_MODES, 'customer');
  const taxCell = reader.number('tax_rate_bp');
  const taxRateBp =
    taxCell === null
      ? 0
      : Number.isNaN(taxCell)
        ? undefined
        : reader.rule('tax_rate_bp', () => validateTaxRateBp(taxCell, 'tax_rate_bp'));
  const { latitude, longitude } = coordinates(reader);
  const accessParking = reader.text('access_parking', 500);
  const accessDoor = reader.text('access_door', 500);
  const accessBestTime = reader.text('access_best_time', 500);

  return reader.result(() => ({
    name,
    kind: kind!,
    street,
    city,
    region,
    postalCode,
    country,
    phone,
    email,
    cadenceWeeks: cadenceWeeks!,
    billingMode: billingMode!,
    taxRateBp: taxRateBp!,
    latitude,
    longitude,
    accessParking,
    accessDoor,
    accessBestTime,
  }));
}

/**
 * Checks each stop against the rows before it and against the stops already in Keenroute (their keys, looked up in
 * one query). Call it once per file: it remembers the rows it has seen.
 */
export function stopDuplicateCheck(existingKeys: ReadonlySet<string>): (stop: StopDraft, row: number) => CellProblem[] {
  const firstRowOf = new Map<string, number>();
  return (stop, row) => {
    const key = stopKey(stop);
    const earlier = firstRowOf.get(key);
    if (earlier !== undefined) return [{ column: 'name', message: `Same name and address as row ${earlier}.` }];
    firstRowOf.set(key, row);
    if (existingKeys.has(key)) {
      return [{ column: 'name', message: 'A stop with this name and address is already in Keenroute.' }];
    }
    return [];
  };
}
