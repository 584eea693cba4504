import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsEmail, IsOptional, IsString, IsUUID, Length, Matches, MaxLength } from 'class-validator';
import { trimmed } from '../../users/dto/invite-user.dto';

/** Trimmed text, with an empty answer read as "none" so a cleared form field clears the value. */
export const trimmedOrNull = ({ value }: { value: unknown }): unknown => {
  if (typeof value !== 'string') return value;
  const text = value.trim();
  return text === '' ? null : text;
};

const emailOrNull = ({ value }: { value: unknown }): unknown => {
  const text = trimmedOrNull({ value });
  return typeof text === 'string' ? text.toLowerCase() : text;
};

export const NAME_MESSAGE = 'Enter a name of 1 to 120 characters.';
export const SINGLE_LINE = /^[^\r\n<>]*$/;

export class CreateCustomerDto {
  @ApiProperty({ example: 'Avery Lind' })
  @Transform(trimmed)
  @IsString({ message: NAME_MESSAGE })
  @Length(1, 120, { message: NAME_MESSAGE })
  @Matches(SINGLE_LINE, { message: 'A name cannot contain line breaks or angle brackets.' })
  name: string;

  @ApiPropertyOptional({ nullable: true, type: String, example: 'avery.lind@demo.keenroute.test' })
  @IsOptional()
  @Transform(emailOrNull)
  @IsEmail({}, { message: 'Enter a valid e-mail address.' })
  @MaxLength(254, { message: 'An e-mail address has at most 254 characters.' })
  email?: string | null;

  @ApiPropertyOptional({ nullable: true, type: String, example: '555-0142' })
  @IsOptional()
  @Transform(trimmedOrNull)
  @IsString()
  @MaxLength(40, { message: 'A phone number has at most 40 characters.' })
  @Matches(SINGLE_LINE, { message: 'A phone number cannot contain line breaks or angle brackets.' })
  phone?: string | null;

  @ApiPropertyOptional({ nullable: true, type: String, format: 'uuid', description: 'Where they work; null: mail-in' })
  @IsOptional()
  @IsUUID('all', { message: 'Choose a stop from the list.' })
  stopId?: string | null;

  @ApiPropertyOptional({ nullable: true, type: String, format: 'uuid', description: 'Their client account' })
  @IsOptional()
  @IsUUID('all', { message: 'Choose a client account from the list.' })
  userId?: string | null;

  @ApiPropertyOptional({ maxLength: 2000 })
  @IsOptional()
  @IsString()
  @MaxLength(2000, { message: 'Notes have at most 2000 characters.' })
  notes?: string | null;

  @ApiPropertyOptional({ description: 'They agreed to e-mailed visit notices' })
  @IsOptional()
  @IsBoolean({ message: 'visitNoticeConsent must be true or false.' })
  visitNoticeConsent?: boolean;

  @ApiPropertyOptional({ description: 'false deactivates the customer; nothing is deleted' })
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false.' })
  active?: boolean;
}
