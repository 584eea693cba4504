import { ApiProperty } from '@nestjs/swagger';
import {
  BILLING_MODES,
  STOP_KINDS,
  WEEKDAYS,
  type BillingMode,
  type OpeningHours,
  type StopKind,
  type Weekday,
} from '@keenroute/shared';
import { GeocodeCandidateDto } from '../../geocoding/dto/geocode-result.dto';
import { GEOCODE_STATUSES, type GeocodeStatus, type Stop } from '../entities/stop.entity';

export class RefDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
}

export class StopSummaryDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: STOP_KINDS }) kind: StopKind;
  @ApiProperty() street: string;
  @ApiProperty() city: string;
  @ApiProperty() region: string;
  @ApiProperty() postalCode: string;
  @ApiProperty() country: string;
  @ApiProperty({ nullable: true, type: Number }) latitude: number | null;
  @ApiProperty({ nullable: true, type: Number }) longitude: number | null;
  @ApiProperty({ enum: GEOCODE_STATUSES }) geocodeStatus: GeocodeStatus;
  @ApiProperty({ nullable: true, type: String }) phone: string | null;
  @ApiProperty({ nullable: true, type: String }) email: string | null;
  @ApiProperty() cadenceWeeks: number;
  @ApiProperty({ enum: BILLING_MODES }) billingMode: BillingMode;
  @ApiProperty({ nullable: true, type: RefDto }) assignedSharpener: RefDto | null;
  @ApiProperty() active: boolean;
  @ApiProperty({ nullable: true, type: String, example: '2026-01-12' }) lastVisitOn: string | null;
  @ApiProperty({ example: '2026-03-09', description: 'Today for a stop never visited' }) nextDueOn: string;
  @ApiProperty({ description: 'Days past due; negative while still to come' }) daysOverdue: number;
  @ApiProperty({ description: 'Active customers at the stop' }) customerCount: number;
}

export class StopDetailDto extends StopSummaryDto {
  @ApiProperty({ example: { mon: [{ opens: '09:00', closes: '17:00' }] } }) openingHours: OpeningHours;
  @ApiProperty({ type: [String] }) closedDates: string[];
  @ApiProperty({ enum: WEEKDAYS, isArray: true }) preferredWeekdays: Weekday[];
  @ApiProperty() taxRateBp: number;
  @ApiProperty() accessParking: string;
  @ApiProperty() accessDoor: string;
  @ApiProperty() accessBestTime: string;
  @ApiProperty({ nullable: true, type: RefDto }) manager: RefDto | null;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

export const STOP_GEOCODING_STATUSES = [
  'found',
  'picked',
  'manual',
  'ambiguous',
  'failed',
  'none',
  'unchanged',
] as const;
export type StopGeocodingStatus = (typeof STOP_GEOCODING_STATUSES)[number];

/** What saving did about the pin: the geocoder's answer, the coordinates given, or nothing to do. */
export class StopGeocodingDto {
  @ApiProperty({ enum: STOP_GEOCODING_STATUSES }) status: StopGeocodingStatus;
  @ApiProperty({ nullable: true, type: String }) message: string | null;
  @ApiProperty({ type: [GeocodeCandidateDto] }) candidates: GeocodeCandidateDto[];
}

export class StopSavedDto extends StopDetailDto {
  @ApiProperty({ type: StopGeocodingDto }) geocoding: StopGeocodingDto;
}

export class StopListDto {
  @ApiProperty({ type: [StopSummaryDto] }) items: StopSummaryDto[];
  @ApiProperty() total: number;
}

export class StopVisitDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: '2026-03-04' }) workedOn: string;
  @ApiProperty({ nullable: true, type: RefDto }) sharpener: RefDto | null;
}

export class StopVisitListDto {
  @ApiProperty({ type: [StopVisitDto] }) items: StopVisitDto[];
  @ApiProperty() total: number;
}

/** A stop with what is derived from its visits, customers and people, as the listing reads it. */
export interface StopRow {
  stop: Stop;
  lastVisitOn: string | null;
  nextDueOn: string;
  daysOverdue: number;
  customerCount: number;
  sharpener: RefDto | null;
  manager: RefDto | null;
}

export const toStopSummary = ({ stop, ...derived }: StopRow): StopSummaryDto => ({
  id: stop.id,
  name: stop.name,
  kind: stop.kind,
  street: stop.street,
  city: stop.city,
  region: stop.region,
  postalCode: stop.postalCode,
  country: stop.country,
  latitude: stop.latitude,
  longitude: stop.longitude,
  geocodeStatus: stop.geocodeStatus,
  phone: stop.phone,
  email: stop.email,
  cadenceWeeks: stop.cadenceWeeks,
  billingMode: stop.billingMode,
  assignedSharpener: derived.sharpener,
  active: stop.active,
  lastVisitOn: derived.lastVisitOn,
  nextDueOn: derived.nextDueOn,
  daysOverdue: derived.daysOverdue,
  customerCount: derived.customerCount,
});

/** node-pg reads a date[] column as Dates at local midnight (TypeORM converts only single dates to text). */
const calendarDate = (value: string | Date): string =>
  typeof value === 'string'
    ? value
    : [value.getFullYear(), value.getMonth() + 1, value.getDate()].map((n) => String(n).padStart(2, '0')).join('-');

export const toStopDetail = (row: StopRow): StopDetailDto => ({
  ...toStopSummary(row),
  openingHours: row.stop.openingHours,
  closedDates: (row.stop.closedDates as (string | Date)[]).map(calendarDate),
  preferredWeekdays: row.stop.preferredWeekdays,
  taxRateBp: row.stop.taxRateBp,
  accessParking: row.stop.accessParking,
  accessDoor: row.stop.accessDoor,
  accessBestTime: row.stop.accessBestTime,
  manager: row.manager,
  createdAt: row.stop.createdAt.toISOString(),
  updatedAt: row.stop.updatedAt.toISOString(),
});
