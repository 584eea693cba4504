import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  BILLING_MODES,
  CADENCE_WEEKS_MAX,
  CADENCE_WEEKS_MIN,
  STOP_KINDS,
  TAX_RATE_MAX_BP,
  TAX_RATE_MIN_BP,
  WEEKDAYS,
  type BillingMode,
  type OpeningHours,
  type StopKind,
  type Weekday,
} from '@keenroute/shared';
import { Transform } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayUnique,
  IsArray,
  IsBoolean,
  IsEmail,
  IsIn,
  IsInt,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Length,
  Matches,
  Max,
  MaxLength,
  Min,
} from 'class-validator';
import { AccessNotesDto } from './access-notes.dto';
import { IsCalendarDate, IsCoordinate, trimmed, trimmedOrEmpty, trimmedOrNull } from './stop-validators';

/** How typed-in coordinates came about: chosen from the geocoder's candidates, or entered by hand. */
export const GEOCODE_CHOICES = ['picked', 'manual'] as const;
export type GeocodeChoice = (typeof GEOCODE_CHOICES)[number];

const upper = ({ value }: { value: unknown }): unknown =>
  typeof value === 'string' ? value.trim().toUpperCase() : value;
const lowerOrNull = ({ value }: { value: unknown }): unknown => {
  const text = trimmedOrNull({ value });
  return typeof text === 'string' ? text.toLowerCase() : text;
};

export class CreateStopDto extends AccessNotesDto {
  @ApiProperty({ example: 'Tanner Street Salon (demo)' })
  @Transform(trimmed)
  @IsString({ message: 'Enter a name of 1 to 120 characters.' })
  @Length(1, 120, { message: 'Enter a name of 1 to 120 characters.' })
  @Matches(/^[^\r\n<>]*$/, { message: 'A name cannot contain line breaks or angle brackets.' })
  name: string;

  @ApiProperty({ enum: STOP_KINDS })
  @IsIn(STOP_KINDS, { message: `Choose a kind: ${STOP_KINDS.join(', ')}.` })
  kind: StopKind;

  @ApiProperty({ example: '104 Alder Row' })
  @Transform(trimmed)
  @IsString({ message: 'Enter the street address (1 to 200 characters).' })
  @Length(1, 200, { message: 'Enter the street address (1 to 200 characters).' })
  street: string;

  @ApiProperty({ example: 'Larkhaven' })
  @Transform(trimmed)
  @IsString({ message: 'Enter the city (1 to 100 characters).' })
  @Length(1, 100, { message: 'Enter the city (1 to 100 characters).' })
  city: string;

  @ApiPropertyOptional({ example: 'Lakeshore' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: 'The region is text of up to 100 characters.' })
  @MaxLength(100, { message: 'The region is text of up to 100 characters.' })
  region?: string;

  @ApiPropertyOptional({ example: '55901' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: 'The postal code is text of up to 20 characters.' })
  @MaxLength(20, { message: 'The postal code is text of up to 20 characters.' })
  postalCode?: string;

  @ApiPropertyOptional({ example: 'US', description: 'ISO 3166-1 alpha-2', default: 'US' })
  @IsOptional()
  @Transform(upper)
  @Matches(/^[A-Z]{2}$/, { message: 'Enter the country as a two-letter code, like US.' })
  country?: string;

  @ApiPropertyOptional({ nullable: true, type: Number, minimum: -90, maximum: 90 })
  @IsCoordinate('latitude')
  latitude?: number | null;

  @ApiPropertyOptional({ nullable: true, type: Number, minimum: -180, maximum: 180 })
  @IsCoordinate('longitude')
  longitude?: number | null;

  @ApiPropertyOptional({ enum: GEOCODE_CHOICES, description: "With coordinates: 'picked' from the candidates" })
  @IsOptional()
  @IsIn(GEOCODE_CHOICES, { message: `geocodeChoice is one of: ${GEOCODE_CHOICES.join(', ')}.` })
  geocodeChoice?: GeocodeChoice;

  @ApiPropertyOptional({ nullable: true, type: String })
  @IsOptional()
  @Transform(trimmedOrNull)
  @IsString({ message: 'A phone number is text of up to 40 characters.' })
  @MaxLength(40, { message: 'A phone number is text of up to 40 characters.' })
  phone?: string | null;

  @ApiPropertyOptional({ nullable: true, type: String })
  @IsOptional()
  @Transform(lowerOrNull)
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  @MaxLength(254, { message: 'Enter a valid e-mail address.' })
  email?: string | null;

  // Shape and times are the shared rules (validateOpeningHours), checked in the service so the field path is exact.
  @ApiPropertyOptional({
    description: 'Windows per weekday, e.g. { "mon": [{ "opens": "09:00", "closes": "17:00" }] }',
  })
  @IsOptional()
  @IsObject({ message: 'Opening hours are a list of windows per weekday.' })
  openingHours?: OpeningHours;

  @ApiPropertyOptional({ type: [String], example: ['2026-12-25'] })
  @IsOptional()
  @IsArray({ message: 'Closed dates are a list of dates like 2026-12-25.' })
  @ArrayMaxSize(366, { message: 'Up to 366 closed dates.' })
  @IsCalendarDate({ each: true, message: 'Closed dates are calendar dates like 2026-12-25.' })
  closedDates?: string[];

  @ApiPropertyOptional({ minimum: CADENCE_WEEKS_MIN, maximum: CADENCE_WEEKS_MAX, description: 'Default by kind' })
  @IsOptional()
  @IsInt({ message: `Cadence is a whole number of weeks from ${CADENCE_WEEKS_MIN} to ${CADENCE_WEEKS_MAX}.` })
  @Min(CADENCE_WEEKS_MIN, {
    message: `Cadence is a whole number of weeks from ${CADENCE_WEEKS_MIN} to ${CADENCE_WEEKS_MAX}.`,
  })
  @Max(CADENCE_WEEKS_MAX, {
    message: `Cadence is a whole number of weeks from ${CADENCE_WEEKS_MIN} to ${CADENCE_WEEKS_MAX}.`,
  })
  cadenceWeeks?: number;

  @ApiPropertyOptional({ enum: WEEKDAYS, isArray: true })
  @IsOptional()
  @IsArray({ message: `Preferred weekdays are a list from: ${WEEKDAYS.join(', ')}.` })
  @ArrayUnique({ message: 'Name each preferred weekday once.' })
  @IsIn(WEEKDAYS, { each: true, message: `Preferred weekdays are a list from: ${WEEKDAYS.join(', ')}.` })
  preferredWeekdays?: Weekday[];

  @ApiPropertyOptional({ enum: BILLING_MODES, default: 'customer' })
  @IsOptional()
  @IsIn(BILLING_MODES, { message: `Billing is one of: ${BILLING_MODES.join(', ')}.` })
  billingMode?: BillingMode;

  @ApiPropertyOptional({ minimum: TAX_RATE_MIN_BP, maximum: TAX_RATE_MAX_BP, description: 'Basis points' })
  @IsOptional()
  @IsInt({ message: taxRateMessage() })
  @Min(TAX_RATE_MIN_BP, { message: taxRateMessage() })
  @Max(TAX_RATE_MAX_BP, { message: taxRateMessage() })
  taxRateBp?: number;

  @ApiPropertyOptional({ nullable: true, type: String, format: 'uuid', description: 'An active sharpener or owner' })
  @IsOptional()
  @IsUUID('all', { message: 'Choose the sharpener from the list.' })
  assignedSharpenerId?: string | null;

  @ApiPropertyOptional({ nullable: true, type: String, format: 'uuid', description: "The shop manager's client user" })
  @IsOptional()
  @IsUUID('all', { message: 'Choose the shop manager from the list.' })
  managerUserId?: string | null;

  @ApiPropertyOptional({ default: true })
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false.' })
  active?: boolean;
}

function taxRateMessage(): string {
  return `The tax rate is a whole number of basis points from ${TAX_RATE_MIN_BP} to ${TAX_RATE_MAX_BP} (30 %).`;
}
