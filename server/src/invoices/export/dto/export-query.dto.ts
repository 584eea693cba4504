import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional } from 'class-validator';
import { IsCalendarDate } from '../../../stops/dto/stop-validators';

/** A date range, both ends included; either end left out means "from the first" or "up to the last". */
export class ExportQueryDto {
  @ApiPropertyOptional({ example: '2026-01-01', description: 'First day included' })
  @IsOptional()
  @IsCalendarDate({ message: 'from is a date like 2026-01-01.' })
  from?: string;

  @ApiPropertyOptional({ example: '2026-12-31', description: 'Last day included' })
  @IsOptional()
  @IsCalendarDate({ message: 'to is a date like 2026-12-31.' })
  to?: string;
}
