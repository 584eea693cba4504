/** Reads what the visit history is built on: the registry as it stands, the settings, the rate card, the counters. */
import {
  addDays,
  type BillingMode,
  type EdgeType,
  type Handedness,
  type OpeningHours,
  type ShearUse,
  type ToolKind,
} from '@keenroute/shared';
import type { EntityManager } from 'typeorm';
import { BusinessProfile } from '../../../invoices/entities/business-profile.entity';
import { RateCardVersion } from '../../../rates/entities/rate-card-version.entity';
import { PlanningSettings } from '../../../route-days/entities/planning-settings.entity';
import { todayIn } from '../../../stops/business-today';
import type { HistoryOptions } from './history-options';

export interface HistoryStop {
  id: string;
  name: string;
  street: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
  email: string | null;
  latitude: number;
  longitude: number;
  openingHours: OpeningHours;
  cadenceWeeks: number;
  billingMode: BillingMode;
  taxRateBp: number;
  assignedSharpenerId: string | null;
  createdOn: string;
}

/** A stretch of a customer's time at one stop: from the day they started, up to (not including) the day they left. */
export interface CustomerSpan {
  rowId: string;
  stopId: string;
  from: string;
  to: string | null;
}

export interface HistoryCustomer {
  id: string;
  name: string;
  email: string | null;
  createdOn: string;
  spans: CustomerSpan[];
}

export interface HistoryShear {
  id: string;
  tagCode: string;
  customerId: string;
  edgeType: EdgeType;
  toolKind: ToolKind;
  lengthIn: number;
  handedness: Handedness;
  use: ShearUse;
  registeredOn: string;
  /** The day it was retired or lost; null while in service. */
  statusOn: string | null;
}

export interface WorkedVisit {
  stopId: string;
  day: string;
  sharpenerId: string | null;
}

/** A "serviced" line of a shear's history that no ticket stands behind yet (the registry seed writes them). */
export interface ServicedEntry {
  id: string;
  shearId: string;
  day: string;
  summary: string;
}

export interface HistorySource {
  /** The last day of the history. */
  end: string;
  stops: HistoryStop[];
  customers: HistoryCustomer[];
  /** In tag-code order. */
  shears: HistoryShear[];
  visits: WorkedVisit[];
  serviced: ServicedEntry[];
  settings: PlanningSettings;
  card: RateCardVersion;
  termsDays: number;
  reminderDays: number[];
  ownerId: string;
  /** Who makes the invoices and records payments at the office: the office manager, else the owner. */
  officeId: string;
  /** The last document number taken, by "KR-2025" / "CN-2025". */
  counters: Map<string, number>;
}

/**
 * The history's last day: yesterday (by the seed's date and by the business's, whichever is earlier: the app's today
 * is the business's), or the day before the earliest ticket or route day already in the database, so the history
 * never lands on a day someone has worked or planned.
 */
async function lastDay(manager: EntityManager, today: string, timeZone: string): Promise<string> {
  const [row] = await manager.query<{ first: string | null }[]>(
    `SELECT to_char(least((SELECT min(visit_day) FROM tickets), (SELECT min(day) FROM route_days)), 'YYYY-MM-DD') AS first`,
  );
  const businessToday = todayIn(timeZone);
  const yesterday = addDays(businessToday < today ? businessToday : today, -1);
  return row?.first && row.first <= yesterday ? addDays(row.first, -1) : yesterday;
}

export async function loadHistorySource(manager: EntityManager, options: HistoryOptions): Promise<HistorySource> {
  const tz = options.timeZone;
  const settings = await manager.getRepository(PlanningSettings).findOneBy({ id: 1 });
  if (!settings) throw new Error('The visit history needs the planning settings (the base); seed them first.');
  const card = await manager.getRepository(RateCardVersion).findOne({ where: {}, order: { version: 'DESC' } });
  if (!card) throw new Error('The visit history needs a rate card; seed one first.');
  const profile = await manager.getRepository(BusinessProfile).findOneBy({ id: 1 });
  const staff = await manager.query<{ id: string; role: string }[]>(
    `SELECT id, role FROM users WHERE active AND role IN ('owner', 'office') ORDER BY created_at, email`,
  );
  const ownerId = staff.find((user) => user.role === 'owner')?.id;
  if (!ownerId) throw new Error('The visit history needs an owner (who sets prices by hand); seed the users first.');

  const stops = await manager.query<HistoryStop[]>(
    `SELECT id, name, street, city, region, postal_code AS "postalCode", country, email, latitude, longitude,
            opening_hours AS "openingHours", cadence_weeks AS "cadenceWeeks", billing_mode AS "billingMode",
            tax_rate_bp AS "taxRateBp", assigned_sharpener_id AS "assignedSharpenerId",
            to_char(created_at AT TIME ZONE $1, 'YYYY-MM-DD') AS "createdOn"
       FROM stops
      WHERE latitude IS NOT NULL AND ($2::uuid[] IS NULL OR id = ANY($2::uuid[]))
      ORDER BY name, street`,
    [tz, options.stopIds],
  );
  const stopIds = stops.map((stop) => stop.id);
  const visits = await manager.query<WorkedVisit[]>(
    `SELECT stop_id AS "stopId", to_char(worked_on, 'YYYY-MM-DD') AS day, sharpener_id AS "sharpenerId"
       FROM stop_visits WHERE stop_id = ANY($1::uuid[]) ORDER BY worked_on`,
    [stopIds],
  );
  const spanRows = await manager.query<(CustomerSpan & Omit<HistoryCustomer, 'spans'>)[]>(
    `SELECT c.id, c.name, c.email, to_char(c.created_at AT TIME ZONE $1, 'YYYY-MM-DD') AS "createdOn",
            h.id AS "rowId", h.stop_id AS "stopId", to_char(h.started_at AT TIME ZONE $1, 'YYYY-MM-DD') AS "from",
            to_char(h.ended_at AT TIME ZONE $1, 'YYYY-MM-DD') AS "to"
       FROM customers c JOIN customer_stop_history h ON h.customer_id = c.id
      WHERE c.id IN (SELECT customer_id FROM customer_stop_history WHERE stop_id = ANY($2::uuid[]))
      ORDER BY c.created_at, c.name, c.email, h.started_at`,
    [tz, stopIds],
  );
  const customers = new Map<string, HistoryCustomer>();
  for (const { rowId, stopId, from, to, ...customer } of spanRows) {
    const entry = customers.get(customer.id) ?? { ...customer, spans: [] };
    entry.spans.push({ rowId, stopId, from, to });
    customers.set(customer.id, entry);
  }
  const customerIds = [...customers.keys()];
  const shears = await manager.query<HistoryShear[]>(
    `SELECT s.id, s.tag_code AS "tagCode", s.customer_id AS "customerId", s.edge_type AS "edgeType",
            s.tool_kind AS "toolKind", s.length_in::float8 AS "lengthIn", s.handedness, s.use,
            COALESCE((SELECT to_char(min(h.happened_on), 'YYYY-MM-DD') FROM shear_history h
                       WHERE h.shear_id = s.id AND h.kind = 'registered'),
                     to_char(s.created_at AT TIME ZONE $1, 'YYYY-MM-DD')) AS "registeredOn",
            CASE WHEN s.status <> 'in-service' THEN
              COALESCE((SELECT to_char(max(h.happened_on), 'YYYY-MM-DD') FROM shear_history h
                         WHERE h.shear_id = s.id AND h.kind = 'status'),
                       to_char(s.updated_at AT TIME ZONE $1, 'YYYY-MM-DD')) END AS "statusOn"
       FROM shears s WHERE s.customer_id = ANY($2::uuid[]) ORDER BY s.tag_code`,
    [tz, customerIds],
  );
  const serviced = await manager.query<ServicedEntry[]>(
    `SELECT h.id, h.shear_id AS "shearId", to_char(h.happened_on, 'YYYY-MM-DD') AS day, h.summary
       FROM shear_history h JOIN shears s ON s.id = h.shear_id
      WHERE h.kind = 'serviced' AND h.ticket_id IS NULL AND s.customer_id = ANY($1::uuid[])
      ORDER BY s.tag_code, h.happened_on`,
    [customerIds],
  );
  const counters = await manager.query<{ series: string; year: number; last_number: number }[]>(
    `SELECT series, year, last_number FROM document_counters`,
  );
  return {
    end: await lastDay(manager, options.today, tz),
    stops,
    customers: [...customers.values()],
    shears,
    visits,
    serviced,
    settings,
    card,
    termsDays: profile?.paymentTermsDays ?? 14,
    reminderDays: profile?.reminderDays ?? [],
    ownerId,
    officeId: staff.find((user) => user.role === 'office')?.id ?? ownerId,
    counters: new Map(counters.map((row) => [`${row.series}-${row.year}`, row.last_number])),
  };
}
