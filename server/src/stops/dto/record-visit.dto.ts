import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsUUID } from 'class-validator';
import { IsCalendarDate } from './stop-validators';

export class RecordVisitDto {
  @ApiProperty({ example: '2026-03-04', description: 'The day the visit was worked' })
  @IsCalendarDate({ message: 'workedOn is a date like 2026-03-04.' })
  workedOn: string;

  @ApiPropertyOptional({ format: 'uuid', description: "Who worked it; default: the stop's assigned sharpener" })
  @IsOptional()
  @IsUUID('all', { message: 'Choose the sharpener from the list.' })
  sharpenerId?: string;
}
