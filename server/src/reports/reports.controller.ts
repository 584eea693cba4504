import { Controller, Get, Param, ParseEnumPipe, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiParam, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Roles } from '../auth/decorators/roles.decorator';
import { notFound } from '../common/errors/domain-error';
import { AnyReportQueryDto, MonthsQueryDto, ReceivablesQueryDto, ReportQueryDto } from './dto/report-query.dto';
import { reportCsv } from './report-csv';
import { REPORT_NAMES, type ReportName } from './report-queries';
import { ReportsService } from './reports.service';

const NAME_OPTIONS = Object.fromEntries(REPORT_NAMES.map((name) => [name, name])) as Record<ReportName, ReportName>;

/** The owner's figures: revenue per stop, route day, sharpener, edge type and month; receivables; cadence; drive cost. */
@ApiTags('reports')
@ApiBearerAuth()
@Roles('owner', 'office')
@Controller('reports')
export class ReportsController {
  constructor(private readonly reports: ReportsService) {}

  @Get('stops')
  stops(@Query() query: ReportQueryDto) {
    return this.reports.stops(query);
  }

  @Get('months')
  months(@Query() query: MonthsQueryDto) {
    return this.reports.months(query);
  }

  @Get('route-days')
  routeDays(@Query() query: ReportQueryDto) {
    return this.reports.routeDays(query);
  }

  @Get('sharpeners')
  sharpeners(@Query() query: ReportQueryDto) {
    return this.reports.sharpeners(query);
  }

  @Get('edge-types')
  edgeTypes(@Query() query: ReportQueryDto) {
    return this.reports.edgeTypes(query);
  }

  @Get('tool-kinds')
  toolKinds(@Query() query: ReportQueryDto) {
    return this.reports.toolKinds(query);
  }

  @Get('receivables')
  receivables(@Query() query: ReceivablesQueryDto) {
    return this.reports.receivables(query);
  }

  @Get('cadence')
  cadence(@Query() query: ReportQueryDto) {
    return this.reports.cadence(query);
  }

  @Get('drive-cost')
  driveCost(@Query() query: ReportQueryDto) {
    return this.reports.driveCost(query);
  }

  /** Any report as a spreadsheet, with the same filters as its page. */
  @Get(':name/csv')
  @ApiProduces('text/csv')
  @ApiParam({ name: 'name', enum: REPORT_NAMES })
  async csv(
    @Param('name', new ParseEnumPipe(NAME_OPTIONS, { exceptionFactory: () => notFound('That report') }))
    name: ReportName,
    @Query() query: AnyReportQueryDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<string> {
    const answer = await this.answerOf(name, query);
    // Headers only once the report is made: a refused range still answers as JSON.
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader(
      'Content-Disposition',
      `attachment; filename="keenroute-${name}-${answer.from}-${answer.to}.csv"`,
    );
    return reportCsv(name, answer);
  }

  private answerOf(name: ReportName, query: AnyReportQueryDto) {
    const run: Record<ReportName, () => Promise<{ from: string; to: string; rows: object[]; totals?: object }>> = {
      stops: () => this.reports.stops(query),
      months: () => this.reports.months(query),
      'route-days': () => this.reports.routeDays(query),
      sharpeners: () => this.reports.sharpeners(query),
      'edge-types': () => this.reports.edgeTypes(query),
      'tool-kinds': () => this.reports.toolKinds(query),
      receivables: () => this.reports.receivables(query),
      cadence: () => this.reports.cadence(query),
      'drive-cost': () => this.reports.driveCost(query),
    };
    return run[name]();
  }
}
