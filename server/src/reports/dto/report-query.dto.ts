import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsUUID } from 'class-validator';
import { IsCalendarDate } from '../../stops/dto/stop-validators';

/** The filters every report takes: a date range (both ends included) and one sharpener. */
export class ReportQueryDto {
  @ApiPropertyOptional({ example: '2026-01-01', description: 'First day included; 12 calendar months back by default' })
  @IsOptional()
  @IsCalendarDate({ message: 'from is a date like 2026-01-01.' })
  from?: string;

  @ApiPropertyOptional({ example: '2026-12-31', description: 'Last day included; today by default' })
  @IsOptional()
  @IsCalendarDate({ message: 'to is a date like 2026-12-31.' })
  to?: string;

  @ApiPropertyOptional({ description: "Only this sharpener's work" })
  @IsOptional()
  @IsUUID('all', { message: 'sharpenerId must be a user id.' })
  sharpenerId?: string;
}

export class MonthsQueryDto extends ReportQueryDto {
  @ApiPropertyOptional({ description: "One stop's trend" })
  @IsOptional()
  @IsUUID('all', { message: 'stopId must be a stop id.' })
  stopId?: string;
}

export const RECEIVABLES_GROUPS = ['customer', 'stop'] as const;
export type ReceivablesGroup = (typeof RECEIVABLES_GROUPS)[number];

export class ReceivablesQueryDto extends ReportQueryDto {
  @ApiPropertyOptional({ enum: RECEIVABLES_GROUPS, description: 'Per bill-to party (default) or per stop' })
  @IsOptional()
  @IsIn(RECEIVABLES_GROUPS, { message: 'groupBy is customer or stop.' })
  groupBy?: ReceivablesGroup;
}

export const CADENCE_GROUPS = ['stop', 'sharpener'] as const;
export type CadenceGroup = (typeof CADENCE_GROUPS)[number];

/** Which of a report's tables: receivables per customer or per stop; cadence per stop or per sharpener. */
export const REPORT_GROUPS = ['customer', 'stop', 'sharpener'] as const;
export type ReportGroup = (typeof REPORT_GROUPS)[number];

/** The routes' query for any report, for the CSV route that serves them all. */
export class AnyReportQueryDto extends MonthsQueryDto {
  @ApiPropertyOptional({
    enum: REPORT_GROUPS,
    description: 'Receivables: customer (default) or stop. Cadence: stop (default) or sharpener.',
  })
  @IsOptional()
  @IsIn(REPORT_GROUPS, { message: 'groupBy is customer, stop or sharpener.' })
  groupBy?: ReportGroup;
}
