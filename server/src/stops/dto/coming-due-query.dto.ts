import { ApiPropertyOptional, PickType } from '@nestjs/swagger';
import { IsOptional, IsUUID } from 'class-validator';
import { PageQueryDto } from '../../common/pagination.dto';
import { IsCalendarDate } from './stop-validators';

export class ComingDueQueryDto extends PickType(PageQueryDto, ['page', 'pageSize'] as const) {
  @ApiPropertyOptional({ format: 'uuid', description: 'Stops assigned to this sharpener' })
  @IsOptional()
  @IsUUID('all', { message: 'sharpenerId is a user id.' })
  sharpenerId?: string;

  @ApiPropertyOptional({
    example: '2026-03-04',
    description: "Any day of the week to plan: stops due on or before that ISO week's Sunday. Default: this week.",
  })
  @IsOptional()
  @IsCalendarDate({ message: 'week is a date like 2026-03-04 (any day of the week to plan).' })
  week?: string;
}
