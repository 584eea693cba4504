import type { BillingMode, OpeningHours, StopKind, Weekday } from '@keenroute/shared';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** How the stop's coordinates were set: by the geocoder, picked from its candidates, typed in, or not yet. */
export const GEOCODE_STATUSES = ['none', 'found', 'picked', 'manual', 'ambiguous', 'failed'] as const;
export type GeocodeStatus = (typeof GEOCODE_STATUSES)[number];

/** node-postgres reads a date[] as Dates at local midnight (TypeORM converts only plain date columns): back to text. */
const calendarDates = {
  to: (value: string[] | undefined) => value,
  from: (value: (string | Date)[] | null): string[] =>
    (value ?? []).map((day) =>
      typeof day === 'string'
        ? day
        : `${day.getFullYear()}-${String(day.getMonth() + 1).padStart(2, '0')}-${String(day.getDate()).padStart(2, '0')}`,
    ),
};

@Entity({ name: 'stops' })
export class Stop {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 16 })
  kind: StopKind;

  @Column({ type: 'varchar', length: 200 })
  street: string;

  @Column({ type: 'varchar', length: 100 })
  city: string;

  @Column({ type: 'varchar', length: 100, default: '' })
  region: string;

  @Column({ name: 'postal_code', type: 'varchar', length: 20, default: '' })
  postalCode: string;

  /** ISO 3166-1 alpha-2. */
  @Column({ type: 'varchar', length: 2, default: 'US' })
  country: string;

  @Column({ type: 'double precision', nullable: true })
  latitude: number | null;

  @Column({ type: 'double precision', nullable: true })
  longitude: number | null;

  @Column({ name: 'geocode_status', type: 'varchar', length: 16, default: 'none' })
  geocodeStatus: GeocodeStatus;

  @Column({ type: 'varchar', length: 40, nullable: true })
  phone: string | null;

  @Column({ type: 'varchar', length: 254, nullable: true })
  email: string | null;

  @Column({ name: 'opening_hours', type: 'jsonb', default: {} })
  openingHours: OpeningHours;

  /** Calendar dates "YYYY-MM-DD" the stop is shut (holidays, refits). */
  @Column({ name: 'closed_dates', type: 'date', array: true, default: [], transformer: calendarDates })
  closedDates: string[];

  @Column({ name: 'cadence_weeks', type: 'smallint' })
  cadenceWeeks: number;

  @Column({ name: 'preferred_weekdays', type: 'varchar', length: 3, array: true, default: [] })
  preferredWeekdays: Weekday[];

  @Column({ name: 'billing_mode', type: 'varchar', length: 16, default: 'customer' })
  billingMode: BillingMode;

  @Column({ name: 'tax_rate_bp', type: 'integer', default: 0 })
  taxRateBp: number;

  @Column({ name: 'access_parking', type: 'varchar', length: 500, default: '' })
  accessParking: string;

  @Column({ name: 'access_door', type: 'varchar', length: 500, default: '' })
  accessDoor: string;

  @Column({ name: 'access_best_time', type: 'varchar', length: 500, default: '' })
  accessBestTime: string;

  @Column({ name: 'assigned_sharpener_id', type: 'uuid', nullable: true })
  assignedSharpenerId: string | null;

  /** The shop manager's client account: they see every customer and shear at this stop. */
  @Column({ name: 'manager_user_id', type: 'uuid', nullable: true })
  managerUserId: string | null;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
