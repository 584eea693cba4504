import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  EDGE_TYPES,
  HANDEDNESS,
  LENGTH_MAX_IN,
  LENGTH_MIN_IN,
  SHEAR_USES,
  TOOL_KINDS,
  type EdgeType,
  type Handedness,
  type ShearUse,
  type ToolKind,
} from '@keenroute/shared';
import { Transform } from 'class-transformer';
import { IsIn, IsNumber, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min } from 'class-validator';
import { trimmed } from '../../users/dto/invite-user.dto';

const SINGLE_LINE = /^[^\r\n<>]*$/;
const LENGTH_RANGE = `Lengths run from ${LENGTH_MIN_IN} to ${LENGTH_MAX_IN} inches.`;

// The shared rules (validateShear) check the finer points, like quarter-inch steps; these give each field its message.
export class CreateShearDto {
  @ApiProperty({ format: 'uuid', description: 'The customer who owns the shear' })
  @IsUUID('all', { message: 'Choose the customer who owns the shear.' })
  customerId: string;

  @ApiPropertyOptional({ example: 'Corvane', maxLength: 80 })
  @IsOptional()
  @Transform(trimmed)
  @IsString()
  @MaxLength(80, { message: 'A make has at most 80 characters.' })
  @Matches(SINGLE_LINE, { message: 'A make cannot contain line breaks or angle brackets.' })
  make?: string;

  @ApiPropertyOptional({ example: 'Series 7', maxLength: 80 })
  @IsOptional()
  @Transform(trimmed)
  @IsString()
  @MaxLength(80, { message: 'A model has at most 80 characters.' })
  @Matches(SINGLE_LINE, { message: 'A model cannot contain line breaks or angle brackets.' })
  model?: string;

  @ApiProperty({ minimum: LENGTH_MIN_IN, maximum: LENGTH_MAX_IN, example: 6.5, description: 'Inches, quarter steps' })
  @IsNumber({}, { message: 'Enter the length in inches.' })
  @Min(LENGTH_MIN_IN, { message: LENGTH_RANGE })
  @Max(LENGTH_MAX_IN, { message: LENGTH_RANGE })
  lengthIn: number;

  @ApiProperty({ enum: EDGE_TYPES })
  @IsIn(EDGE_TYPES, { message: `Choose an edge type: ${EDGE_TYPES.join(', ')}.` })
  edgeType: EdgeType;

  @ApiProperty({ enum: TOOL_KINDS })
  @IsIn(TOOL_KINDS, { message: `Choose a tool kind: ${TOOL_KINDS.join(', ')}.` })
  toolKind: ToolKind;

  @ApiPropertyOptional({ enum: HANDEDNESS, default: 'right' })
  @IsOptional()
  @IsIn(HANDEDNESS, { message: 'Choose right or left.' })
  handedness?: Handedness;

  @ApiPropertyOptional({ enum: SHEAR_USES, default: 'hair' })
  @IsOptional()
  @IsIn(SHEAR_USES, { message: 'Choose hair or grooming.' })
  use?: ShearUse;

  @ApiPropertyOptional({ maxLength: 2000 })
  @IsOptional()
  @IsString()
  @MaxLength(2000, { message: 'Notes have at most 2000 characters.' })
  notes?: string;
}
