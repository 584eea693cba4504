import { ApiProperty, ApiPropertyOptional, OmitType } from '@nestjs/swagger';
import { ADD_ON_CODES, ADD_ONS_PER_LINE_MAX, type AddOnCode } from '@keenroute/shared';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayUnique,
  IsArray,
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
import { CreateShearDto } from '../../shears/dto/create-shear.dto';
import { trimmed } from '../../users/dto/invite-user.dto';
import { BENCH_STATUSES, type BenchStatus } from '../bench-status';

const ADD_ON_MESSAGE = `Add-ons are chosen from: ${ADD_ON_CODES.join(', ')}.`;

/** A shear met for the first time at the stop: registered to the ticket's customer as the line is added. */
export class NewShearDto extends OmitType(CreateShearDto, ['customerId'] as const) {}

export class AddLineDto {
  @ApiPropertyOptional({ format: 'uuid', description: 'The shear, by id; or give its tag code, or a new shear' })
  @ValidateIf((dto: AddLineDto) => dto.tagCode === undefined && dto.newShear === undefined)
  @IsUUID('all', { message: 'Give the shear: its id, the tag code on its label, or a new shear.' })
  shearId?: string;

  @ApiPropertyOptional({ example: 'KR-000123', description: 'As typed or scanned from the label' })
  @IsOptional()
  @IsString()
  @MaxLength(20, { message: 'A tag code has at most 20 characters.' })
  tagCode?: string;

  @ApiPropertyOptional({ type: NewShearDto, description: 'Registers the shear to the ticket’s customer first' })
  @IsOptional()
  @ValidateNested()
  @Type(() => NewShearDto)
  newShear?: NewShearDto;

  @ApiPropertyOptional({ enum: ADD_ON_CODES, isArray: true })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(ADD_ONS_PER_LINE_MAX, { message: `A shear carries at most ${ADD_ONS_PER_LINE_MAX} add-ons.` })
  @ArrayUnique({ message: 'An add-on is listed twice.' })
  @IsIn(ADD_ON_CODES, { each: true, message: ADD_ON_MESSAGE })
  addOns?: AddOnCode[];
}

export class UpdateLineDto {
  @ApiPropertyOptional({ enum: ADD_ON_CODES, isArray: true })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(ADD_ONS_PER_LINE_MAX, { message: `A shear carries at most ${ADD_ONS_PER_LINE_MAX} add-ons.` })
  @ArrayUnique({ message: 'An add-on is listed twice.' })
  @IsIn(ADD_ON_CODES, { each: true, message: ADD_ON_MESSAGE })
  addOns?: AddOnCode[];

  @ApiPropertyOptional({ enum: BENCH_STATUSES, description: 'waiting, on the bench, ready, handed back' })
  @IsOptional()
  @IsIn(BENCH_STATUSES, { message: `Choose a bench status: ${BENCH_STATUSES.join(', ')}.` })
  benchStatus?: BenchStatus;

  @ApiPropertyOptional({ maxLength: 2000 })
  @IsOptional()
  @IsString()
  @MaxLength(2000, { message: 'Notes have at most 2000 characters.' })
  notes?: string;
}

export class OverrideLineDto {
  @ApiProperty({ example: 3000, description: 'The price of this pair, integer cents (0 for no charge)' })
  @IsInt({ message: 'Enter the price in whole cents.' })
  @Min(0, { message: 'A price cannot be below zero.' })
  @Max(1_000_000, { message: 'That price is too large for one pair.' })
  cents: number;

  @ApiProperty({ example: 'Regular customer, tip was already set', description: 'Kept in the audit' })
  @Transform(trimmed)
  @IsString({ message: 'Say why the price is set by hand.' })
  @Length(3, 500, { message: 'Say why the price is set by hand, in 3 to 500 characters.' })
  @Matches(/^[^<>]*$/, { message: 'A reason cannot contain angle brackets.' })
  reason: string;
}
