import { Text } from '@mantine/core';
import { useSharpenersReport } from '../api/get-sharpeners-report';
import { count, decimal, hoursMinutes, money, moneyOrDash } from '../format';
import type { ReportParams, SharpenerRevenueRow, SharpenersReport } from '../types';
import { CsvButton } from './csv-button';
import { ReportSection } from './report-section';
import { ReportStates } from './report-states';
import { ReportTable, type ReportColumn } from './report-table';

type Totals = NonNullable<SharpenersReport['totals']>;

const columns: ReportColumn<SharpenerRevenueRow, Totals>[] = [
  {
    key: 'sharpener',
    label: 'Sharpener',
    minWidth: 160,
    sortValue: (row) => row.sharpenerName,
    // Work nobody is named on: tickets taken off a route day by someone no longer on the team.
    cell: (row) =>
      row.sharpenerName ?? (
        <Text span c="dimmed">
          No sharpener named
        </Text>
      ),
  },
  {
    key: 'routeDays',
    label: 'Route days',
    numeric: true,
    sortValue: (r) => r.routeDays,
    cell: (r) => count(r.routeDays),
    total: (t) => count(t.routeDays),
  },
  {
    key: 'visits',
    label: 'Visits',
    numeric: true,
    sortValue: (r) => r.visits,
    cell: (r) => count(r.visits),
    total: (t) => count(t.visits),
  },
  {
    key: 'shears',
    label: 'Shears',
    numeric: true,
    sortValue: (r) => r.shears,
    cell: (r) => count(r.shears),
    total: (t) => count(t.shears),
  },
  {
    key: 'revenue',
    label: 'Revenue',
    numeric: true,
    sortValue: (r) => r.revenueCents,
    cell: (r) => money(r.revenueCents),
    total: (t) => money(t.revenueCents),
  },
  {
    key: 'bench',
    label: 'Bench time',
    numeric: true,
    sortValue: (r) => r.benchMinutes,
    cell: (r) => hoursMinutes(r.benchMinutes),
    total: (t) => hoursMinutes(t.benchMinutes),
  },
  {
    key: 'drive',
    label: 'Drive',
    numeric: true,
    sortValue: (r) => r.driveMinutes,
    cell: (r) => hoursMinutes(r.driveMinutes),
    total: (t) => hoursMinutes(t.driveMinutes),
  },
  {
    key: 'km',
    label: 'Km',
    numeric: true,
    sortValue: (r) => r.km,
    cell: (r) => decimal(r.km),
    total: (t) => decimal(t.km),
  },
  {
    key: 'route',
    label: 'Route time',
    numeric: true,
    sortValue: (r) => r.routeMinutes,
    cell: (r) => hoursMinutes(r.routeMinutes),
    total: (t) => hoursMinutes(t.routeMinutes),
  },
  {
    key: 'perRouteHour',
    label: 'Per route hour',
    numeric: true,
    sortValue: (r) => r.perRouteHourCents,
    cell: (r) => moneyOrDash(r.perRouteHourCents),
    total: (t) => moneyOrDash(t.perRouteHourCents),
  },
  {
    key: 'perVisit',
    label: 'Per visit',
    numeric: true,
    sortValue: (r) => r.perVisitCents,
    cell: (r) => moneyOrDash(r.perVisitCents),
    total: (t) => moneyOrDash(t.perVisitCents),
  },
];

/** Each sharpener's route days and revenue; tickets off a route day count for whoever opened them. */
export function SharpenersSection({ params }: { params: ReportParams }) {
  const report = useSharpenersReport(params);
  return (
    <ReportStates
      query={report}
      what="the revenue per sharpener"
      chart={false}
      isEmpty={(data) => data.rows.length === 0}
      emptyTitle="No sharpener worked in these dates."
    >
      {(data) => (
        <ReportSection
          title="By sharpener"
          description="Tickets taken off a route day (drop-offs, mail-ins) count for whoever opened them."
          actions={<CsvButton name="sharpeners" params={params} label="Revenue per sharpener" />}
        >
          <ReportTable
            label="Revenue per sharpener"
            columns={columns}
            rows={data.rows}
            rowKey={(row) => row.sharpenerId ?? 'none'}
            totals={data.totals}
            totalsLabel="Everyone"
            minWidth={1000}
          />
        </ReportSection>
      )}
    </ReportStates>
  );
}
