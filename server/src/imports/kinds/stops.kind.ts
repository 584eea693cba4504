import type { EntityManager } from 'typeorm';
import { DEMO_ADDRESSES } from '../../database/seeds/demo-city';
import { Stop } from '../../stops/entities/stop.entity';
import { insertMany } from '../insert-many';
import {
  readStopRow,
  STOP_COLUMNS,
  STOP_REQUIRED_COLUMNS,
  stopDuplicateCheck,
  stopKey,
  type StopDraft,
} from '../rows/stop-rows';
import type { ImportHandler } from './import-handler';

const address = DEMO_ADDRESSES[1]!;

const STOP_PROPERTIES = [
  'name',
  'kind',
  'street',
  'city',
  'region',
  'postalCode',
  'country',
  'phone',
  'email',
  'cadenceWeeks',
  'billingMode',
  'taxRateBp',
  'latitude',
  'longitude',
  'geocodeStatus',
  'accessParking',
  'accessDoor',
  'accessBestTime',
] as const;

export const stopsHandler: ImportHandler<StopDraft, StopDraft> = {
  columns: STOP_COLUMNS,
  required: STOP_REQUIRED_COLUMNS,
  example: {
    name: 'Brassmill Cuts (example)',
    kind: 'salon',
    street: address.street,
    city: address.city,
    region: address.region,
    postal_code: address.postalCode,
    country: address.country,
    phone: '555-0142',
    email: 'hello@brassmill-cuts.example',
    cadence_weeks: '8',
    billing_mode: 'customer',
    tax_rate_bp: '825',
    latitude: String(address.latitude),
    longitude: String(address.longitude),
    access_parking: 'Two visitor spaces behind the shop',
    access_door: 'Side door by the loading bay',
    access_best_time: 'Tuesday mornings before 11',
  },
  read: readStopRow,

  async prepare(manager: EntityManager, drafts: readonly StopDraft[]) {
    // One query for the whole file: which of its name-and-address keys are already taken.
    const taken: { name: string; street: string; city: string; postalCode: string }[] = await manager.query(
      `SELECT s.name, s.street, s.city, s.postal_code AS "postalCode"
         FROM stops s
        WHERE (lower(s.name), lower(s.street), lower(s.city), lower(s.postal_code)) IN (
          SELECT lower(f.name), lower(f.street), lower(f.city), lower(f.postal_code)
            FROM unnest($1::text[], $2::text[], $3::text[], $4::text[]) AS f (name, street, city, postal_code))`,
      [
        drafts.map((stop) => stop.name),
        drafts.map((stop) => stop.street),
        drafts.map((stop) => stop.city),
        drafts.map((stop) => stop.postalCode),
      ],
    );
    const isDuplicate = stopDuplicateCheck(new Set(taken.map(stopKey)));
    return (draft, row) => {
      const problems = isDuplicate(draft, row);
      return { ready: problems.length === 0 ? draft : null, problems };
    };
  },

  async insert({ manager }, rows) {
    const stops = rows.map((stop) => ({
      ...stop,
      // Typed-in coordinates are kept as the person's own placement, as the stop form does.
      geocodeStatus: stop.latitude === null ? ('none' as const) : ('manual' as const),
    }));
    await insertMany(manager, Stop, STOP_PROPERTIES, stops);
  },
};
