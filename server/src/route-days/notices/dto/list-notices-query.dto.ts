import { ApiProperty } from '@nestjs/swagger';
import { IsCalendarDate } from '../../../stops/dto/stop-validators';

export class ListNoticesQueryDto {
  @ApiProperty({ example: '2026-12-08', description: 'The route day the notices announce' })
  @IsCalendarDate({ message: 'day is a date like 2026-12-08.' })
  day: string;
}
