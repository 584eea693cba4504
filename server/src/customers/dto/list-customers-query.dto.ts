import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsUUID } from 'class-validator';
import { PageQueryDto } from '../../common/pagination.dto';

export const CUSTOMER_SORTS = ['name', 'email', 'stop', 'createdAt'] as const;
export type CustomerSort = (typeof CUSTOMER_SORTS)[number];

/** Query strings carry "true"/"false" as text; anything else is left for IsBoolean to refuse. */
export const queryBoolean = ({ value }: { value: unknown }): unknown =>
  value === 'true' ? true : value === 'false' ? false : value;

export class ListCustomersQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'stopId must be a stop id.' })
  stopId?: string;

  @ApiPropertyOptional({ enum: ['true', 'false'] })
  @IsOptional()
  @Transform(queryBoolean)
  @IsBoolean({ message: 'active must be true or false.' })
  active?: boolean;

  @ApiPropertyOptional({ enum: CUSTOMER_SORTS, default: 'name' })
  @IsOptional()
  @IsIn(CUSTOMER_SORTS, { message: `Sort by one of: ${CUSTOMER_SORTS.join(', ')}.` })
  sort: CustomerSort = 'name';
}
