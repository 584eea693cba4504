import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, Matches } from 'class-validator';
import { IsCalendarDate } from '../../../stops/dto/stop-validators';

export class StatementQueryDto {
  @ApiPropertyOptional({ example: '2026-12-01', description: "First day of the period; default the 1st of to's month" })
  @IsOptional()
  @IsCalendarDate({ message: 'from is a date like 2026-12-01.' })
  from?: string;

  @ApiPropertyOptional({ example: '2026-12-31', description: 'Last day of the period; default today (business time)' })
  @IsOptional()
  @IsCalendarDate({ message: 'to is a date like 2026-12-31.' })
  to?: string;

  @ApiPropertyOptional({
    example: 'USD',
    description: 'Needed only when the account has invoices in several currencies',
  })
  @IsOptional()
  @Matches(/^[A-Z]{3}$/, { message: 'currency is a three-letter code like USD.' })
  currency?: string;
}
