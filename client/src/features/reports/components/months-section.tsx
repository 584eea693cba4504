import { CompositeChart } from '@mantine/charts';
import { Stack } from '@mantine/core';
import { useMonthsReport } from '../api/get-months-report';
import { compactDollars, count, formatMonth, formatShortMonth, money, moneyOrDash } from '../format';
import type { MonthRow, ReportParams } from '../types';
import { CsvButton } from './csv-button';
import { ReportSection } from './report-section';
import { ReportStates } from './report-states';
import { ReportTable, type ReportColumn } from './report-table';
import { sumsOf, totalCell } from '../totals';

type MonthTotals = Partial<Omit<MonthRow, 'month'>>;

// The server sends no totals for months: the page adds up what adds up.
export const MONTH_SUMS = ['visits', 'tickets', 'shears', 'revenueCents', 'invoicedCents', 'collectedCents'] as const;

const columns: ReportColumn<MonthRow, MonthTotals>[] = [
  { key: 'month', label: 'Month', cell: (row) => formatMonth(row.month), sortValue: (row) => row.month },
  {
    key: 'visits',
    label: 'Visits',
    numeric: true,
    sortValue: (r) => r.visits,
    cell: (r) => count(r.visits),
    total: (t) => totalCell(t.visits, count),
  },
  {
    key: 'tickets',
    label: 'Tickets',
    numeric: true,
    sortValue: (r) => r.tickets,
    cell: (r) => count(r.tickets),
    total: (t) => totalCell(t.tickets, count),
  },
  {
    key: 'shears',
    label: 'Shears',
    numeric: true,
    sortValue: (r) => r.shears,
    cell: (r) => count(r.shears),
    total: (t) => totalCell(t.shears, count),
  },
  {
    key: 'revenue',
    label: 'Revenue',
    numeric: true,
    sortValue: (r) => r.revenueCents,
    cell: (r) => money(r.revenueCents),
    total: (t) => totalCell(t.revenueCents, money),
  },
  {
    key: 'perVisit',
    label: 'Per visit',
    numeric: true,
    sortValue: (r) => r.perVisitCents,
    cell: (r) => moneyOrDash(r.perVisitCents),
    total: (t) => totalCell(t.perVisitCents, moneyOrDash),
  },
  {
    key: 'invoiced',
    label: 'Invoiced',
    numeric: true,
    sortValue: (r) => r.invoicedCents,
    cell: (r) => moneyOrDash(r.invoicedCents),
    total: (t) => totalCell(t.invoicedCents, moneyOrDash),
  },
  {
    key: 'collected',
    label: 'Collected',
    numeric: true,
    sortValue: (r) => r.collectedCents,
    cell: (r) => moneyOrDash(r.collectedCents),
    total: (t) => totalCell(t.collectedCents, moneyOrDash),
  },
];

/** The work done each month (revenue), against what was invoiced and what came in. */
export function MonthsSection({ params }: { params: ReportParams }) {
  const report = useMonthsReport(params);
  return (
    <ReportStates
      query={report}
      what="the revenue by month"
      isEmpty={(data) => data.rows.length === 0}
      emptyTitle="No months in these dates."
    >
      {(data) => (
        <Stack gap="md">
          <ReportSection
            title="Revenue, invoiced and collected"
            description="Revenue is the work done that month; invoiced counts invoices issued less credit notes; collected counts every payment received."
          >
            <CompositeChart
              h={280}
              data={data.rows.map((row) => ({
                month: formatShortMonth(row.month),
                Invoiced: (row.invoicedCents ?? 0) / 100,
                Collected: (row.collectedCents ?? 0) / 100,
                Revenue: row.revenueCents / 100,
              }))}
              dataKey="month"
              series={[
                { name: 'Invoiced', color: 'keenTeal.3', type: 'bar' },
                { name: 'Collected', color: 'keenTeal.7', type: 'bar' },
                { name: 'Revenue', color: 'brass.6', type: 'line' },
              ]}
              valueFormatter={(value) => money(Math.round(value * 100))}
              yAxisProps={{ tickFormatter: (value: number) => compactDollars(value), width: 56 }}
              curveType="linear"
              maxBarWidth={18}
              withLegend
              // Recharts sorts a legend by name unless told not to; the series' order reads better.
              legendProps={{ itemSorter: null }}
              aria-label="Revenue, invoiced and collected by month"
            />
          </ReportSection>
          <ReportSection
            title="By month"
            actions={<CsvButton name="months" params={params} label="Revenue by month" />}
          >
            <ReportTable
              label="Revenue by month"
              columns={columns}
              rows={data.rows}
              rowKey={(row) => row.month}
              totals={data.totals ?? sumsOf(data.rows, MONTH_SUMS)}
              minWidth={820}
            />
          </ReportSection>
        </Stack>
      )}
    </ReportStates>
  );
}
