import { ApiPropertyOptional } from '@nestjs/swagger';
import { STOP_KINDS, type StopKind } from '@keenroute/shared';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsUUID } from 'class-validator';
import { PageQueryDto } from '../../common/pagination.dto';

export const STOP_SORTS = ['name', 'city', 'kind', 'nextDueOn', 'createdAt'] as const;
export type StopSort = (typeof STOP_SORTS)[number];

/** Query strings carry text: "true" and "false" become booleans, anything else is left for the validator to refuse. */
export const booleanQuery = ({ value }: { value: unknown }): unknown =>
  value === 'true' ? true : value === 'false' ? false : value;

export class ListStopsQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: STOP_KINDS })
  @IsOptional()
  @IsIn(STOP_KINDS, { message: `Choose a kind: ${STOP_KINDS.join(', ')}.` })
  kind?: StopKind;

  @ApiPropertyOptional({ format: 'uuid', description: 'Stops assigned to this sharpener' })
  @IsOptional()
  @IsUUID('all', { message: 'sharpenerId is a user id.' })
  sharpenerId?: string;

  @ApiPropertyOptional({ type: Boolean })
  @IsOptional()
  @Transform(booleanQuery)
  @IsBoolean({ message: 'active is true or false.' })
  active?: boolean;

  @ApiPropertyOptional({ enum: STOP_SORTS, default: 'name' })
  @IsOptional()
  @IsIn(STOP_SORTS, { message: `Sort by one of: ${STOP_SORTS.join(', ')}.` })
  sort: StopSort = 'name';
}
