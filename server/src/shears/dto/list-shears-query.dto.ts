import { ApiPropertyOptional } from '@nestjs/swagger';
import {
  EDGE_TYPES,
  SHEAR_STATUSES,
  TOOL_KINDS,
  type EdgeType,
  type ShearStatus,
  type ToolKind,
} from '@keenroute/shared';
import { IsIn, IsOptional, IsUUID } from 'class-validator';
import { PageQueryDto } from '../../common/pagination.dto';

export const SHEAR_SORTS = ['tagCode', 'make', 'lengthIn', 'edgeType', 'customer', 'createdAt'] as const;
export type ShearSort = (typeof SHEAR_SORTS)[number];

export class ListShearsQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'customerId must be a customer id.' })
  customerId?: string;

  @ApiPropertyOptional({ format: 'uuid', description: 'Shears of the customers who work at this stop' })
  @IsOptional()
  @IsUUID('all', { message: 'stopId must be a stop id.' })
  stopId?: string;

  @ApiPropertyOptional({ enum: EDGE_TYPES })
  @IsOptional()
  @IsIn(EDGE_TYPES, { message: `Choose an edge type: ${EDGE_TYPES.join(', ')}.` })
  edgeType?: EdgeType;

  @ApiPropertyOptional({ enum: TOOL_KINDS })
  @IsOptional()
  @IsIn(TOOL_KINDS, { message: `Choose a tool kind: ${TOOL_KINDS.join(', ')}.` })
  toolKind?: ToolKind;

  @ApiPropertyOptional({ enum: SHEAR_STATUSES })
  @IsOptional()
  @IsIn(SHEAR_STATUSES, { message: `Choose a status: ${SHEAR_STATUSES.join(', ')}.` })
  status?: ShearStatus;

  @ApiPropertyOptional({ enum: SHEAR_SORTS, default: 'tagCode' })
  @IsOptional()
  @IsIn(SHEAR_SORTS, { message: `Sort by one of: ${SHEAR_SORTS.join(', ')}.` })
  sort: ShearSort = 'tagCode';
}
