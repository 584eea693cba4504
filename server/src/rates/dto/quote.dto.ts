import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ADD_ON_CODES,
  ADD_ONS_PER_LINE_MAX,
  EDGE_TYPES,
  HANDEDNESS,
  LENGTH_MAX_IN,
  LENGTH_MIN_IN,
  SHEAR_USES,
  TAX_RATE_MAX_BP,
  TAX_RATE_MIN_BP,
  TICKET_LINES_MAX,
  TOOL_KINDS,
  type AddOnCode,
  type EdgeType,
  type Handedness,
  type ShearUse,
  type ToolKind,
} from '@keenroute/shared';
import { Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsNumber,
  IsOptional,
  Max,
  Min,
  ValidateNested,
} from 'class-validator';

// The shared rules check the finer points (quarter-inch steps); these decorators give each field its message.
export class QuoteShearDto {
  @ApiProperty({ enum: EDGE_TYPES })
  @IsIn(EDGE_TYPES, { message: `Choose one of: ${EDGE_TYPES.join(', ')}.` })
  edgeType: EdgeType;

  @ApiProperty({ enum: TOOL_KINDS })
  @IsIn(TOOL_KINDS, { message: `Choose one of: ${TOOL_KINDS.join(', ')}.` })
  toolKind: ToolKind;

  @ApiProperty({ minimum: LENGTH_MIN_IN, maximum: LENGTH_MAX_IN, example: 6.5 })
  @IsNumber({}, { message: 'Enter the length in inches.' })
  @Min(LENGTH_MIN_IN, { message: `Lengths run from ${LENGTH_MIN_IN} to ${LENGTH_MAX_IN} inches.` })
  @Max(LENGTH_MAX_IN, { message: `Lengths run from ${LENGTH_MIN_IN} to ${LENGTH_MAX_IN} inches.` })
  lengthIn: number;

  @ApiProperty({ enum: HANDEDNESS })
  @IsIn(HANDEDNESS, { message: 'Choose right or left.' })
  handedness: Handedness;

  @ApiPropertyOptional({ enum: SHEAR_USES })
  @IsOptional()
  @IsIn(SHEAR_USES, { message: 'Choose hair or grooming.' })
  use?: ShearUse;
}

export class QuoteLineDto {
  @ApiProperty({ type: QuoteShearDto })
  @ValidateNested()
  @Type(() => QuoteShearDto)
  shear: QuoteShearDto;

  @ApiPropertyOptional({ enum: ADD_ON_CODES, isArray: true })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(ADD_ONS_PER_LINE_MAX)
  @IsIn(ADD_ON_CODES, { each: true, message: `Add-ons are: ${ADD_ON_CODES.join(', ')}.` })
  addOns?: AddOnCode[];
}

export class QuoteDto {
  @ApiProperty({ type: [QuoteLineDto] })
  @IsArray()
  @ArrayMinSize(1, { message: 'Add at least one shear.' })
  @ArrayMaxSize(TICKET_LINES_MAX, { message: `At most ${TICKET_LINES_MAX} shears on one ticket.` })
  @ValidateNested({ each: true })
  @Type(() => QuoteLineDto)
  lines: QuoteLineDto[];

  @ApiProperty({ description: 'The stop tax rate in basis points (825 = 8.25 %)', example: 825 })
  @IsInt({ message: 'Enter the tax rate in basis points (825 = 8.25 %).' })
  @Min(TAX_RATE_MIN_BP)
  @Max(TAX_RATE_MAX_BP, { message: `Tax rates run from 0 to ${TAX_RATE_MAX_BP / 100} %.` })
  taxRateBp: number;

  @ApiPropertyOptional({ description: 'This ticket carries the visit trip charge' })
  @IsOptional()
  @IsBoolean()
  chargeTrip?: boolean;
}
