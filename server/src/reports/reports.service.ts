import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../config/environment';
import { todayIn } from '../stops/business-today';
import { suggestionsFor, type Suggestion } from './drive-cost';
import type { AnyReportQueryDto, ReceivablesGroup } from './dto/report-query.dto';
import { CADENCE_GRACE_DAYS, REPORT_QUERIES, type ReportName, type ReportOptions } from './report-queries';
import { reportRange, type ReportRange } from './report-range';
import {
  camelRow,
  type CadenceRow,
  type CadenceSharpenerRow,
  type EdgeTypeRow,
  type MonthRow,
  type ReceivablesRow,
  type RevenueFigures,
  type RouteDayRevenueRow,
  type SharpenerRevenueRow,
  type StopRevenueRow,
  type ToolKindRow,
} from './report-rows';

export interface ReportAnswer<Row> {
  from: string;
  to: string;
  sharpenerId: string | null;
  rows: Row[];
  totals?: RevenueFigures;
}

export type ReceivablesAnswer = ReportAnswer<ReceivablesRow> & {
  asOf: string;
  groupBy: ReceivablesGroup;
  totals: Omit<ReceivablesRow, 'key' | 'name' | 'stopName'>;
};
export type CadenceAnswer = ReportAnswer<CadenceRow> & { bySharpener: CadenceSharpenerRow[]; graceDays: number };
export interface DriveCostRow {
  stopId: string;
  stopName: string;
  city: string;
  cadenceWeeks: number;
  visits: number;
  revenueCents: number;
  benchMinutes: number;
  routeMinutes: number;
  driveMinutes: number;
  perRouteHourCents: number;
  suggestions: Suggestion[];
}
export type DriveCostAnswer = ReportAnswer<DriveCostRow> & { medianPerRouteHourCents: number | null };

type Raw = Record<string, unknown>;
const TOTAL_ONLY = ['is_total'];

/** The owner's reports: each one SQL statement over the range (server/src/reports/queries), shaped for the API. */
@Injectable()
export class ReportsService {
  private readonly timeZone: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  range(query: AnyReportQueryDto): ReportRange {
    return reportRange(query, todayIn(this.timeZone));
  }

  private async run(name: ReportName, range: ReportRange, options: Partial<ReportOptions> = {}): Promise<Raw[]> {
    const { sql, params } = REPORT_QUERIES[name](range, { timeZone: this.timeZone, ...options });
    return this.dataSource.query(sql, params);
  }

  private answer<Row>(range: ReportRange, rows: Row[]): ReportAnswer<Row> {
    return { from: range.from, to: range.to, sharpenerId: range.sharpenerId, rows };
  }

  /** Rows and the totals row (is_total) apart; the totals keep only the figures. */
  private withTotals<Row>(range: ReportRange, raw: Raw[], labels: readonly string[]): ReportAnswer<Row> {
    const rows = raw.filter((row) => !row.is_total).map((row) => camelRow<Row>(row, TOTAL_ONLY));
    const total = raw.find((row) => row.is_total)!;
    return { ...this.answer(range, rows), totals: camelRow<RevenueFigures>(total, [...TOTAL_ONLY, ...labels]) };
  }

  async stops(query: AnyReportQueryDto): Promise<ReportAnswer<StopRevenueRow>> {
    const range = this.range(query);
    return this.withTotals(range, await this.run('stops', range), ['stop_id', 'stop_name', 'city', 'cadence_weeks']);
  }

  async routeDays(query: AnyReportQueryDto): Promise<ReportAnswer<RouteDayRevenueRow>> {
    const range = this.range(query);
    return this.answer(
      range,
      (await this.run('route-days', range)).map((row) => camelRow(row)),
    );
  }

  async sharpeners(query: AnyReportQueryDto): Promise<ReportAnswer<SharpenerRevenueRow>> {
    const range = this.range(query);
    return this.withTotals(range, await this.run('sharpeners', range), ['sharpener_id', 'sharpener_name']);
  }

  async months(query: AnyReportQueryDto): Promise<ReportAnswer<MonthRow>> {
    const range = this.range(query);
    const stopId = query.stopId ?? null;
    // Invoices and payments belong to the business and its bill-to parties, not to one stop or one sharpener.
    const whole = stopId === null && range.sharpenerId === null;
    const rows = (await this.run('months', range, { stopId })).map((row) => {
      const month = camelRow<MonthRow>(row);
      return whole ? month : { ...month, invoicedCents: null, collectedCents: null };
    });
    return this.answer(range, rows);
  }

  async edgeTypes(query: AnyReportQueryDto): Promise<ReportAnswer<EdgeTypeRow>> {
    const range = this.range(query);
    const raw = await this.run('edge-types', range);
    return this.answer(
      range,
      raw.map(({ key, ...row }) => ({ edgeType: key as string, ...camelRow<Omit<EdgeTypeRow, 'edgeType'>>(row) })),
    );
  }

  async toolKinds(query: AnyReportQueryDto): Promise<ReportAnswer<ToolKindRow>> {
    const range = this.range(query);
    const raw = await this.run('tool-kinds', range);
    return this.answer(
      range,
      raw.map(({ key, ...row }) => ({ toolKind: key as string, ...camelRow<Omit<ToolKindRow, 'toolKind'>>(row) })),
    );
  }

  async receivables(query: AnyReportQueryDto): Promise<ReceivablesAnswer> {
    const range = this.range(query);
    // The routes refuse any other groupBy: the JSON route by its DTO, the CSV route by csvGroup.
    const groupBy: ReceivablesGroup = query.groupBy === 'stop' ? 'stop' : 'customer';
    const raw = await this.run('receivables', range, { groupBy });
    const rows = raw.filter((row) => !row.is_total).map((row) => camelRow<ReceivablesRow>(row, TOTAL_ONLY));
    const totals = camelRow<ReceivablesAnswer['totals']>(
      raw.find((row) => row.is_total)!,
      [...TOTAL_ONLY, 'key', 'name', 'stop_name'],
    );
    return { ...this.answer(range, rows), sharpenerId: null, asOf: range.to, groupBy, totals };
  }

  async cadence(query: AnyReportQueryDto): Promise<CadenceAnswer> {
    const range = this.range(query);
    const raw = await this.run('cadence', range);
    const rows = raw.filter((row) => !row.is_by_sharpener).map((row) => camelRow<CadenceRow>(row, ['is_by_sharpener']));
    const bySharpener = raw
      .filter((row) => row.is_by_sharpener)
      .map(({ sharpener_id, sharpener_name, visits, on_time, late }) =>
        camelRow<CadenceSharpenerRow>({ sharpener_id, sharpener_name, visits, on_time, late }),
      );
    return { ...this.answer(range, rows), bySharpener, graceDays: CADENCE_GRACE_DAYS };
  }

  async driveCost(query: AnyReportQueryDto): Promise<DriveCostAnswer> {
    const range = this.range(query);
    const raw = await this.run('drive-cost', range);
    const median = raw.length > 0 ? (raw[0]!.median_per_route_hour_cents as number) : null;
    const rows = raw.map((row): DriveCostRow => {
      const stop = {
        stopId: row.stop_id as string,
        stopName: row.stop_name as string,
        city: row.city as string,
        cadenceWeeks: row.cadence_weeks as number,
        visits: row.visits as number,
        revenueCents: row.revenue_cents as number,
        benchMinutes: row.bench_minutes as number,
        routeMinutes: row.route_minutes as number,
        driveMinutes: row.drive_minutes as number,
        perRouteHourCents: row.per_route_hour_cents as number,
      };
      const neighbour =
        row.neighbour_stop_id === null
          ? null
          : {
              stopId: row.neighbour_stop_id as string,
              name: row.neighbour_name as string,
              distanceKm: row.neighbour_km as number,
              driveMinutes: row.neighbour_drive_minutes as number,
            };
      return { ...stop, suggestions: suggestionsFor(stop, neighbour, median ?? 0) };
    });
    return { ...this.answer(range, rows), medianPerRouteHourCents: median };
  }

  /** Any report by its route name: what the CSV route serves. */
  byName(name: ReportName, query: AnyReportQueryDto): Promise<ReportAnswer<object>> {
    const run: Record<ReportName, () => Promise<ReportAnswer<object>>> = {
      stops: () => this.stops(query),
      months: () => this.months(query),
      'route-days': () => this.routeDays(query),
      sharpeners: () => this.sharpeners(query),
      'edge-types': () => this.edgeTypes(query),
      'tool-kinds': () => this.toolKinds(query),
      receivables: () => this.receivables(query),
      cadence: () => this.cadence(query),
      'drive-cost': () => this.driveCost(query),
    };
    return run[name]();
  }
}
