import { ApiPropertyOptional, PickType } from '@nestjs/swagger';
import { PageQueryDto } from '../../common/pagination.dto';
import { Type } from 'class-transformer';
import { IsIn, IsInt, IsOptional, IsUUID, Max, Min } from 'class-validator';
import { IsCalendarDate } from '../../stops/dto/stop-validators';
import { SETTLEMENTS, TICKET_STATUSES, type Settlement, type TicketStatus } from '../entities/ticket.entity';

/** The day's or stop's tickets; page as every list has it, and longer pages (a full stop visit fits on one). */
export class ListTicketsQueryDto extends PickType(PageQueryDto, ['page'] as const) {
  @ApiPropertyOptional({ example: '2026-12-09', description: 'The visit day' })
  @IsOptional()
  @IsCalendarDate({ message: 'day is a date like 2026-12-09.' })
  day?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'stopId must be a stop id.' })
  stopId?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'customerId must be a customer id.' })
  customerId?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'routeDayId must be a route day id.' })
  routeDayId?: string;

  @ApiPropertyOptional({ enum: TICKET_STATUSES })
  @IsOptional()
  @IsIn(TICKET_STATUSES, { message: `Choose a status: ${TICKET_STATUSES.join(', ')}.` })
  status?: TicketStatus;

  @ApiPropertyOptional({ enum: SETTLEMENTS })
  @IsOptional()
  @IsIn(SETTLEMENTS, { message: `Choose a settlement: ${SETTLEMENTS.join(', ')}.` })
  settlement?: Settlement;

  @ApiPropertyOptional({ default: 50, maximum: 200 })
  @IsOptional()
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(200)
  pageSize = 50;
}
