import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { BOOKING_ITEM_COUNT_MAX, EDGE_TYPES, TOOL_KINDS, type EdgeType, type ToolKind } from '@keenroute/shared';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  Equals,
  IsArray,
  IsBoolean,
  IsEmail,
  IsIn,
  IsInt,
  IsOptional,
  IsString,
  IsUUID,
  Length,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateIf,
  ValidateNested,
} from 'class-validator';

const trimmed = ({ value }: { value: unknown }): unknown => (typeof value === 'string' ? value.trim() : value);
const lowerTrimmed = ({ value }: { value: unknown }): unknown =>
  typeof value === 'string' ? value.trim().toLowerCase() : value;

/** No control characters at all (CR and LF above all): these values reach e-mail headers and the day sheet. */
const ONE_LINE = /^[^\p{Cc}<>]*$/u;
const PHONE = /^[0-9+().\- ]{5,40}$/;
/** Most kinds listed on one booking. */
export const BOOKING_ITEMS_MAX = 20;

export class BookingItemDto {
  @ApiProperty({ enum: TOOL_KINDS })
  @IsIn(TOOL_KINDS, { message: `toolKind is one of ${TOOL_KINDS.join(', ')}.` })
  toolKind: ToolKind;

  @ApiProperty({ enum: EDGE_TYPES })
  @IsIn(EDGE_TYPES, { message: `edgeType is one of ${EDGE_TYPES.join(', ')}.` })
  edgeType: EdgeType;

  @ApiProperty({ minimum: 1, maximum: BOOKING_ITEM_COUNT_MAX })
  @IsInt({ message: `count is a whole number of pairs, 1 to ${BOOKING_ITEM_COUNT_MAX}.` })
  @Min(1, { message: `count is a whole number of pairs, 1 to ${BOOKING_ITEM_COUNT_MAX}.` })
  @Max(BOOKING_ITEM_COUNT_MAX, { message: `count is a whole number of pairs, 1 to ${BOOKING_ITEM_COUNT_MAX}.` })
  count: number;
}

/** A line of a new booking: shears by kind, or (signed in as a client) one of their own registered shears. */
export class BookingLineDto {
  @ApiPropertyOptional({ format: 'uuid', description: "A signed-in client's own shear; kind and count then follow it" })
  @IsOptional()
  @IsUUID('all', { message: 'Choose one of your registered shears.' })
  shearId?: string;

  @ApiPropertyOptional({ enum: TOOL_KINDS })
  @ValidateIf((line: BookingLineDto) => !line.shearId)
  @IsIn(TOOL_KINDS, { message: `toolKind is one of ${TOOL_KINDS.join(', ')}.` })
  toolKind?: ToolKind;

  @ApiPropertyOptional({ enum: EDGE_TYPES })
  @ValidateIf((line: BookingLineDto) => !line.shearId)
  @IsIn(EDGE_TYPES, { message: `edgeType is one of ${EDGE_TYPES.join(', ')}.` })
  edgeType?: EdgeType;

  @ApiPropertyOptional({ minimum: 1, maximum: BOOKING_ITEM_COUNT_MAX, description: '1 for an own shear' })
  @ValidateIf((line: BookingLineDto) => !line.shearId || line.count !== undefined)
  @IsInt({ message: `count is a whole number of pairs, 1 to ${BOOKING_ITEM_COUNT_MAX}.` })
  @Min(1, { message: `count is a whole number of pairs, 1 to ${BOOKING_ITEM_COUNT_MAX}.` })
  @Max(BOOKING_ITEM_COUNT_MAX, { message: `count is a whole number of pairs, 1 to ${BOOKING_ITEM_COUNT_MAX}.` })
  count?: number;
}

const ITEMS_MESSAGE = `List the shears: 1 to ${BOOKING_ITEMS_MAX} kinds.`;

export class QuoteBookingDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'Choose a stop from the list.' })
  stopId: string;

  @ApiProperty({ type: [BookingItemDto] })
  @IsArray({ message: ITEMS_MESSAGE })
  @ArrayMinSize(1, { message: ITEMS_MESSAGE })
  @ArrayMaxSize(BOOKING_ITEMS_MAX, { message: ITEMS_MESSAGE })
  @ValidateNested({ each: true })
  @Type(() => BookingItemDto)
  items: BookingItemDto[];
}

export class CreateBookingDto {
  @ApiProperty({ format: 'uuid' })
  @IsUUID('all', { message: 'Choose a stop from the list.' })
  stopId: string;

  @ApiProperty({ type: [BookingLineDto] })
  @IsArray({ message: ITEMS_MESSAGE })
  @ArrayMinSize(1, { message: ITEMS_MESSAGE })
  @ArrayMaxSize(BOOKING_ITEMS_MAX, { message: ITEMS_MESSAGE })
  @ValidateNested({ each: true })
  @Type(() => BookingLineDto)
  items: BookingLineDto[];

  @ApiPropertyOptional({ format: 'uuid', nullable: true, type: String, description: 'Null for a mail-in' })
  @IsOptional()
  @IsUUID('all', { message: 'Choose one of the route days listed.' })
  routeDayId?: string | null;

  @ApiProperty({ description: 'Shears sent by post instead of left at the stop' })
  @IsBoolean({ message: 'mailIn is true or false.' })
  mailIn: boolean;

  @ApiProperty({ maxLength: 120 })
  @Transform(trimmed)
  @IsString({ message: 'Enter your name (1 to 120 characters).' })
  @Length(1, 120, { message: 'Enter your name (1 to 120 characters).' })
  @Matches(ONE_LINE, { message: 'A name is one line, without < or >.' })
  name: string;

  @ApiProperty({ maxLength: 254 })
  @Transform(lowerTrimmed)
  @IsString({ message: 'Enter a valid e-mail address.' })
  @MaxLength(254, { message: 'An e-mail address has at most 254 characters.' })
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  @Matches(ONE_LINE, { message: 'Enter a valid e-mail address.' })
  email: string;

  @ApiProperty({ example: '555-0142' })
  @Transform(trimmed)
  @IsString({ message: 'Enter a phone number: digits, spaces, + ( ) - . (5 to 40 characters).' })
  @Matches(PHONE, { message: 'Enter a phone number: digits, spaces, + ( ) - . (5 to 40 characters).' })
  phone: string;

  @ApiPropertyOptional({ maxLength: 1000 })
  @IsOptional()
  @Transform(trimmed)
  @IsString({ message: 'Notes are text.' })
  @MaxLength(1000, { message: 'Notes have at most 1000 characters.' })
  notes?: string;

  @ApiProperty({ description: 'Agrees to be contacted about this drop-off; must be true' })
  @Equals(true, { message: 'Tick the box to agree to be contacted about this drop-off.' })
  consent: boolean;

  @ApiPropertyOptional({ description: 'Leave empty (a field people never see)' })
  @IsOptional()
  @IsString()
  @MaxLength(200)
  website?: string;

  @ApiProperty({ format: 'uuid', description: 'Made once per form, so a double submit makes one booking' })
  @IsUUID('all', { message: 'idempotencyKey is a UUID the form makes once.' })
  idempotencyKey: string;
}

export class ChangeBookingDto {
  @ApiPropertyOptional({ type: [BookingItemDto] })
  @IsOptional()
  @IsArray({ message: ITEMS_MESSAGE })
  @ArrayMinSize(1, { message: ITEMS_MESSAGE })
  @ArrayMaxSize(BOOKING_ITEMS_MAX, { message: ITEMS_MESSAGE })
  @ValidateNested({ each: true })
  @Type(() => BookingItemDto)
  items?: BookingItemDto[];

  @ApiPropertyOptional({ maxLength: 1000 })
  @IsOptional()
  @Transform(trimmed)
  @IsString({ message: 'Notes are text.' })
  @MaxLength(1000, { message: 'Notes have at most 1000 characters.' })
  notes?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @Transform(trimmed)
  @IsString({ message: 'Enter a phone number: digits, spaces, + ( ) - . (5 to 40 characters).' })
  @Matches(PHONE, { message: 'Enter a phone number: digits, spaces, + ( ) - . (5 to 40 characters).' })
  phone?: string;

  @ApiPropertyOptional({ format: 'uuid', description: "Another of the stop's route days" })
  @IsOptional()
  @IsUUID('all', { message: 'Choose one of the route days listed.' })
  routeDayId?: string;
}

export class PublicStopQueryDto {
  @ApiPropertyOptional({ description: 'Part of the stop name or town' })
  @IsOptional()
  @Transform(trimmed)
  @IsString()
  @MaxLength(100, { message: 'Search with at most 100 characters.' })
  q?: string;
}
