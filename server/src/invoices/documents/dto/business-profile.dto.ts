import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsEmail,
  IsInt,
  IsOptional,
  IsString,
  Length,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateIf,
  registerDecorator,
} from 'class-validator';
import { trimmed, trimmedOrEmpty } from '../../../stops/dto/stop-validators';

export const PAYMENT_TERMS_MAX_DAYS = 120;
export const REMINDER_STAGES_MAX = 5;
export const REMINDER_DAY_MAX = 365;

const upper = ({ value }: { value: unknown }): unknown =>
  typeof value === 'string' ? value.trim().toUpperCase() : value;
const lower = ({ value }: { value: unknown }): unknown =>
  typeof value === 'string' ? value.trim().toLowerCase() : value;

/** Each reminder day later than the one before: the stages go out in that order. */
function IsAscendingDistinct(message: string) {
  return (object: object, propertyName: string) =>
    registerDecorator({
      name: 'isAscendingDistinct',
      target: object.constructor,
      propertyName,
      options: { message },
      validator: {
        validate: (value: unknown) =>
          Array.isArray(value) && value.every((day, i) => i === 0 || Number(day) > Number(value[i - 1])),
      },
    });
}

const text = (field: string, max: number) => `${field} is text of up to ${max} characters.`;

/** PUT /api/business-profile: every field is optional; what is left out stays as it is. */
export class UpdateBusinessProfileDto {
  @ApiPropertyOptional({ example: 'Larkhaven Edge Works (demo)' })
  @IsOptional()
  @Transform(trimmed)
  @IsString({ message: 'Enter the business name (1 to 120 characters).' })
  @Length(1, 120, { message: 'Enter the business name (1 to 120 characters).' })
  @Matches(/^[^\r\n<>]*$/, { message: 'A name cannot contain line breaks or angle brackets.' })
  name?: string;

  @ApiPropertyOptional({ example: '8 Whetstone Lane' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: text('The street', 200) })
  @MaxLength(200, { message: text('The street', 200) })
  street?: string;

  @ApiPropertyOptional({ example: 'Larkhaven' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: text('The city', 100) })
  @MaxLength(100, { message: text('The city', 100) })
  city?: string;

  @ApiPropertyOptional({ example: 'Lakeshore' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: text('The region', 100) })
  @MaxLength(100, { message: text('The region', 100) })
  region?: string;

  @ApiPropertyOptional({ example: '55901' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: text('The postal code', 20) })
  @MaxLength(20, { message: text('The postal code', 20) })
  postalCode?: string;

  @ApiPropertyOptional({ example: 'US', description: 'ISO 3166-1 alpha-2' })
  @IsOptional()
  @Transform(upper)
  @Matches(/^[A-Z]{2}$/, { message: 'Enter the country as a two-letter code, like US.' })
  country?: string;

  @ApiPropertyOptional({ example: '555-0142' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: text('A phone number', 40) })
  @MaxLength(40, { message: text('A phone number', 40) })
  phone?: string;

  @ApiPropertyOptional({ example: 'office@edgeworks.demo.test', description: 'Empty for none' })
  @IsOptional()
  @Transform(lower)
  @IsString({ message: 'Enter a valid e-mail address, or leave it empty.' })
  @ValidateIf((dto: UpdateBusinessProfileDto) => dto.email !== '')
  @IsEmail({}, { message: 'Enter a valid e-mail address, or leave it empty.' })
  @MaxLength(254, { message: 'Enter a valid e-mail address, or leave it empty.' })
  email?: string;

  @ApiPropertyOptional({ example: 'https://edgeworks.demo.test', description: 'Empty for none' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: 'Enter the website as an address starting with https:// or http://, or leave it empty.' })
  @MaxLength(200, { message: text('The website', 200) })
  @Matches(/^(|https?:\/\/\S+)$/, {
    message: 'Enter the website as an address starting with https:// or http://, or leave it empty.',
  })
  website?: string;

  @ApiPropertyOptional({ example: '41-7788123', description: 'Printed on invoices when set' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: text('The tax id', 40) })
  @MaxLength(40, { message: text('The tax id', 40) })
  taxId?: string;

  @ApiPropertyOptional({ example: 'Thank you for your business.' })
  @IsOptional()
  @Transform(trimmedOrEmpty)
  @IsString({ message: text('The invoice footer', 1000) })
  @MaxLength(1000, { message: text('The invoice footer', 1000) })
  invoiceFooter?: string;

  @ApiPropertyOptional({ minimum: 0, maximum: PAYMENT_TERMS_MAX_DAYS, example: 14 })
  @IsOptional()
  @IsInt({ message: `Payment terms are a whole number of days from 0 to ${PAYMENT_TERMS_MAX_DAYS}.` })
  @Min(0, { message: `Payment terms are a whole number of days from 0 to ${PAYMENT_TERMS_MAX_DAYS}.` })
  @Max(PAYMENT_TERMS_MAX_DAYS, {
    message: `Payment terms are a whole number of days from 0 to ${PAYMENT_TERMS_MAX_DAYS}.`,
  })
  paymentTermsDays?: number;

  @ApiPropertyOptional({ type: [Number], example: [7, 21, 45], description: 'Days after the due date, ascending' })
  @IsOptional()
  @IsArray({ message: 'Reminder days are a list of whole numbers of days, like [7, 21, 45].' })
  @ArrayMinSize(1, { message: 'Keep at least one reminder day.' })
  @ArrayMaxSize(REMINDER_STAGES_MAX, { message: `At most ${REMINDER_STAGES_MAX} reminder days.` })
  @IsInt({ each: true, message: `Each reminder day is a whole number from 1 to ${REMINDER_DAY_MAX}.` })
  @Min(1, { each: true, message: `Each reminder day is a whole number from 1 to ${REMINDER_DAY_MAX}.` })
  @Max(REMINDER_DAY_MAX, { each: true, message: `Each reminder day is a whole number from 1 to ${REMINDER_DAY_MAX}.` })
  @IsAscendingDistinct('List the reminder days in ascending order, each once (like 7, 21, 45).')
  reminderDays?: number[];
}

export class BusinessProfileDto {
  @ApiProperty() name: string;
  @ApiProperty() street: string;
  @ApiProperty() city: string;
  @ApiProperty() region: string;
  @ApiProperty() postalCode: string;
  @ApiProperty() country: string;
  @ApiProperty() phone: string;
  @ApiProperty() email: string;
  @ApiProperty() website: string;
  @ApiProperty() taxId: string;
  @ApiProperty() invoiceFooter: string;
  @ApiProperty() paymentTermsDays: number;
  @ApiProperty({ type: [Number] }) reminderDays: number[];
  @ApiProperty({
    nullable: true,
    type: String,
    description: 'Where the logo is fetched (with the bearer token); changes with each upload; null: no logo',
  })
  logoUrl: string | null;
}
