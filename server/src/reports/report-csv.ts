import { decimalAmount, toCsv, type CsvCell } from '../invoices/export/csv-cells';
import type { Suggestion } from './drive-cost';
import type { ReportName } from './report-queries';

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

/** The report as CSV: its rows, then its totals (where it has them) on a last row named "Total". */
export function reportCsv(name: ReportName, answer: { rows: object[]; totals?: object }): string {
  const columns = REPORT_COLUMNS[name];
  const rows = answer.rows.map((row) => columns.map((column) => column.cell(row as Record<string, unknown>)));
  if (answer.totals) {
    const totals = answer.totals as Record<string, unknown>;
    rows.push(columns.map((column, i) => (i === 0 ? 'Total' : column.cell(totals))));
  }
  return toCsv(
    columns.map((column) => column.header),
    rows,
  );
}
