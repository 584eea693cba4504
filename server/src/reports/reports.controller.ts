import { Controller, Get, Param, ParseEnumPipe, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiParam, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Roles } from '../auth/decorators/roles.decorator';
import { notFound } from '../common/errors/domain-error';
import { AnyReportQueryDto, MonthsQueryDto, ReceivablesQueryDto, ReportQueryDto } from './dto/report-query.dto';
import { csvGroup, reportCsv } from './report-csv';
import { REPORT_NAMES, type ReportName } from './report-queries';
import { ReportsService } from './reports.service';

/** A report name from the path, or 404: the names are the report routes'. */
function reportNamePipe() {
  const names = Object.fromEntries(REPORT_NAMES.map((name) => [name, name])) as Record<ReportName, ReportName>;
  return new ParseEnumPipe(names, { exceptionFactory: () => notFound('That report') });
}

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

  /** Any report as a spreadsheet, with the same filters as its page; groupBy picks the table where a page has two. */
  @Get(':name/csv')
  @ApiProduces('text/csv')
  @ApiParam({ name: 'name', enum: REPORT_NAMES })
  async csv(
    @Param('name', reportNamePipe())
    name: ReportName,
    @Query() query: AnyReportQueryDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<string> {
    const groupBy = csvGroup(name, query.groupBy);
    const answer = await this.reports.byName(name, query);
    // Headers only once the report is made: a refused range still answers as JSON.
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader(
      'Content-Disposition',
      `attachment; filename="keenroute-${name}${groupBy ? `-by-${groupBy}` : ''}-${answer.from}-${answer.to}.csv"`,
    );
    return reportCsv(name, answer, groupBy);
  }
}
