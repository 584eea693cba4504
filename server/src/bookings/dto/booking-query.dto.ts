import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsUUID } from 'class-validator';
import { IsCalendarDate } from '../../stops/dto/stop-validators';
import { BOOKING_STATUSES, type BookingStatus } from '../entities/booking.entity';

export class BookingQueryDto {
  @ApiPropertyOptional({ example: '2026-12-08', description: 'Bookings for route days on this date' })
  @IsOptional()
  @IsCalendarDate({ message: 'day is a date YYYY-MM-DD.' })
  day?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'stopId is a stop id.' })
  stopId?: string;

  @ApiPropertyOptional({ format: 'uuid' })
  @IsOptional()
  @IsUUID('all', { message: 'routeDayId is a route day id.' })
  routeDayId?: string;

  @ApiPropertyOptional({ enum: BOOKING_STATUSES })
  @IsOptional()
  @IsIn(BOOKING_STATUSES, { message: `status is one of ${BOOKING_STATUSES.join(', ')}.` })
  status?: BookingStatus;
}
