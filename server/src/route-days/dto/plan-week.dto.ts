import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsOptional, IsUUID } from 'class-validator';
import { IsCalendarDate } from '../../stops/dto/stop-validators';

export class PlanWeekDto {
  @ApiProperty({ example: '2026-12-09', description: 'Any day of the week to plan' })
  @IsCalendarDate({ message: 'week is a date like 2026-12-09 (any day of the week to plan).' })
  week: string;

  @ApiPropertyOptional({ type: [String], description: 'Plan only these sharpeners; default every active sharpener' })
  @IsOptional()
  @IsArray()
  @ArrayMaxSize(50)
  @IsUUID('all', { each: true, message: 'sharpenerIds are user ids.' })
  sharpenerIds?: string[];
}
