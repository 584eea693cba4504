import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsUUID } from 'class-validator';
import { IsCalendarDate } from '../../stops/dto/stop-validators';

export class WeekQueryDto {
  @ApiPropertyOptional({ example: '2026-12-09', description: 'Any day of the week; default this week' })
  @IsOptional()
  @IsCalendarDate({ message: 'week is a date like 2026-12-09 (any day of the week).' })
  week?: string;

  @ApiPropertyOptional({ format: 'uuid', description: 'Only this sharpener (a sharpener always sees only their own)' })
  @IsOptional()
  @IsUUID('all', { message: 'sharpenerId is a user id.' })
  sharpenerId?: string;
}
