import { DomainError } from '../common/errors/domain-error';
import { decimalAmount, toCsv, type CsvCell } from '../invoices/export/csv-cells';
import type { Suggestion } from './drive-cost';
import { CADENCE_GROUPS, RECEIVABLES_GROUPS, type ReportGroup } from './dto/report-query.dto';
import type { ReportName } from './report-queries';
import type { CadenceSharpenerRow } from './report-rows';

/** One CSV column: its header and how to read the cell from an answer row. */
interface Column {
  header: string;
  cell: (row: Record<string, unknown>) => CsvCell;
}

const text = (header: string, key: string): Column => ({ header, cell: (row) => (row[key] as string | null) ?? '' });
const number = (header: string, key: string): Column => ({ header, cell: (row) => (row[key] as number | null) ?? '' });
/** Cents as a plain decimal amount ("1234.50"), so a spreadsheet adds the column up. */
const money = (header: string, key: string): Column => ({
  header,
  cell: (row) => (row[key] === null || row[key] === undefined ? '' : decimalAmount(row[key] as number)),
});

const FIGURES: Column[] = [
  number('Visits', 'visits'),
  number('Tickets', 'tickets'),
  number('Shears', 'shears'),
  money('Revenue', 'revenueCents'),
  number('Bench minutes', 'benchMinutes'),
  number('Drive minutes', 'driveMinutes'),
  number('Route minutes', 'routeMinutes'),
  number('Km', 'km'),
  money('Per visit', 'perVisitCents'),
  money('Per bench hour', 'perBenchHourCents'),
  money('Per route hour', 'perRouteHourCents'),
  money('Per km', 'perKmCents'),
  number('Shears per visit', 'shearsPerVisit'),
];

const SHARE: Column = { header: 'Share %', cell: (row) => ((row.shareBp as number) / 100).toFixed(2) };

function suggestionText(s: Suggestion): string {
  switch (s.kind) {
    case 'longer-cadence':
      return `every ${s.newCadenceWeeks} weeks instead of ${s.cadenceWeeks}: ${s.driveMinutesSavedPerYear} drive minutes a year fewer, ${decimalAmount(s.perRouteHourCents)} per route hour`;
    case 'pair-with-neighbour':
      return `same day as ${s.neighbourName} (${s.distanceKm} km): ${s.driveMinutesSavedPerVisit} drive minutes a visit fewer, ${decimalAmount(s.perRouteHourCents)} per route hour`;
    case 'trip-charge':
      return `trip charge ${decimalAmount(s.tripChargeCents)} a visit: ${decimalAmount(s.perRouteHourCents)} per route hour`;
  }
}

/** Each report's columns, in the order the page shows them. */
export const REPORT_COLUMNS: Record<ReportName, Column[]> = {
  stops: [text('Stop', 'stopName'), text('City', 'city'), number('Cadence weeks', 'cadenceWeeks'), ...FIGURES],
  months: [
    text('Month', 'month'),
    number('Visits', 'visits'),
    number('Tickets', 'tickets'),
    number('Shears', 'shears'),
    money('Revenue', 'revenueCents'),
    money('Per visit', 'perVisitCents'),
    money('Invoiced', 'invoicedCents'),
    money('Collected', 'collectedCents'),
  ],
  'route-days': [text('Day', 'day'), text('Sharpener', 'sharpenerName'), number('Stops', 'stops'), ...FIGURES],
  sharpeners: [text('Sharpener', 'sharpenerName'), number('Route days', 'routeDays'), ...FIGURES],
  'edge-types': [
    text('Edge type', 'edgeType'),
    number('Lines', 'lines'),
    money('Revenue', 'revenueCents'),
    money('Average', 'averageCents'),
    SHARE,
  ],
  'tool-kinds': [
    text('Tool kind', 'toolKind'),
    number('Lines', 'lines'),
    money('Revenue', 'revenueCents'),
    money('Average', 'averageCents'),
    SHARE,
  ],
  receivables: [
    text('Name', 'name'),
    text('Stop', 'stopName'),
    number('Invoices', 'invoices'),
    money('Current', 'currentCents'),
    money('1-30 days', 'days1to30Cents'),
    money('31-60 days', 'days31to60Cents'),
    money('61-90 days', 'days61to90Cents'),
    money('Over 90 days', 'over90Cents'),
    money('Total', 'totalCents'),
  ],
  cadence: [
    text('Stop', 'stopName'),
    text('Sharpener', 'sharpenerName'),
    number('Cadence weeks', 'cadenceWeeks'),
    number('Visits', 'visits'),
    number('On time', 'onTime'),
    number('Late', 'late'),
    number('Average gap days', 'averageGapDays'),
    number('Worst days late', 'worstLateDays'),
  ],
  'drive-cost': [
    text('Stop', 'stopName'),
    text('City', 'city'),
    number('Cadence weeks', 'cadenceWeeks'),
    number('Visits', 'visits'),
    money('Revenue', 'revenueCents'),
    number('Route minutes', 'routeMinutes'),
    number('Drive minutes', 'driveMinutes'),
    money('Per route hour', 'perRouteHourCents'),
    {
      header: 'Suggestions',
      cell: (row) => (row.suggestions as Suggestion[]).map(suggestionText).join('; '),
    },
  ],
};

/** The cadence page's other table: on time and late per sharpener. */
const CADENCE_BY_SHARPENER: Column[] = [
  text('Sharpener', 'sharpenerName'),
  number('Visits', 'visits'),
  number('On time', 'onTime'),
  number('Late', 'late'),
];

/** The reports whose page has more than one table, and the groupBy that names each (the first is the default). */
const CSV_GROUPS: Partial<Record<ReportName, readonly ReportGroup[]>> = {
  receivables: RECEIVABLES_GROUPS,
  cadence: CADENCE_GROUPS,
};

/** The groupBy a report's CSV was asked for, refused where that report has no such table. */
export function csvGroup(name: ReportName, groupBy: ReportGroup | undefined): ReportGroup | undefined {
  const groups = CSV_GROUPS[name] ?? [];
  if (groupBy === undefined || groups.includes(groupBy)) return groupBy;
  const message = groups.length
    ? `groupBy for the ${name} report is ${groups.join(' or ')}.`
    : `The ${name} report has one table: leave groupBy out.`;
  throw new DomainError('invalid_input', message, { groupBy: [message] });
}

function table(columns: Column[], answerRows: object[], totals?: object): string {
  const rows = answerRows.map((row) => columns.map((column) => column.cell(row as Record<string, unknown>)));
  if (totals) {
    const cells = totals as Record<string, unknown>;
    rows.push(columns.map((column, i) => (i === 0 ? 'Total' : column.cell(cells))));
  }
  return toCsv(
    columns.map((column) => column.header),
    rows,
  );
}

/** The report as CSV: its rows, then its totals (where it has them) on a last row named "Total". */
export function reportCsv(
  name: ReportName,
  answer: { rows: object[]; totals?: object; bySharpener?: CadenceSharpenerRow[] },
  groupBy?: ReportGroup,
): string {
  if (name === 'cadence' && groupBy === 'sharpener') return table(CADENCE_BY_SHARPENER, answer.bySharpener ?? []);
  return table(REPORT_COLUMNS[name], answer.rows, answer.totals);
}
