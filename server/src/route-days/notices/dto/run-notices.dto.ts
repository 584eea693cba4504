import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional } from 'class-validator';
import { IsCalendarDate } from '../../../stops/dto/stop-validators';

export class RunNoticesDto {
  @ApiPropertyOptional({
    example: '2026-12-05',
    description: "The day to count from; default today in the business's time zone (a test or a catch-up run).",
  })
  @IsOptional()
  @IsCalendarDate({ message: 'today is a date like 2026-12-05.' })
  today?: string;
}

export class NoticeRunDto {
  @ApiProperty({ example: '2026-12-05' }) today: string;
  @ApiProperty({ example: '2026-12-08', description: 'Route days after today up to this one were announced' })
  through: string;
  @ApiProperty({ description: 'Stops on those route days' }) stops: number;
  @ApiProperty({ description: 'Jobs queued now; a stop queued earlier this hour is not queued again' })
  queued: number;
}
