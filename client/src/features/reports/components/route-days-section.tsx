import { Anchor } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { formatDay } from '@/lib/format';
import { useRouteDaysReport } from '../api/get-route-days-report';
import { count, decimal, hoursMinutes, money, moneyOrDash } from '../format';
import type { ReportParams, RouteDayRevenueRow, RouteDaysReport } from '../types';
import { CsvButton } from './csv-button';
import { ReportSection } from './report-section';
import { ReportStates } from './report-states';
import { ReportTable, type ReportColumn } from './report-table';
import { sumsOf, totalCell } from '../totals';

type Totals = Partial<NonNullable<RouteDaysReport['totals']>>;

const ROUTE_DAY_SUMS = [
  'stops',
  'visits',
  'shears',
  'revenueCents',
  'benchMinutes',
  'driveMinutes',
  'routeMinutes',
  'km',
] as const;

const columns: ReportColumn<RouteDayRevenueRow, Totals>[] = [
  {
    key: 'day',
    label: 'Route day',
    sortValue: (row) => row.day,
    minWidth: 130,
    cell: (row) => (
      <Anchor component={Link} to={paths.routeDays.sheet.getHref(row.routeDayId)} fw={600}>
        {formatDay(row.day)}
      </Anchor>
    ),
  },
  { key: 'sharpener', label: 'Sharpener', sortValue: (row) => row.sharpenerName, cell: (row) => row.sharpenerName },
  {
    key: 'stops',
    label: 'Stops',
    numeric: true,
    sortValue: (r) => r.stops,
    cell: (r) => count(r.stops),
    total: (t) => totalCell(t.stops, count),
  },
  {
    key: 'visits',
    label: 'Visits',
    numeric: true,
    sortValue: (r) => r.visits,
    cell: (r) => count(r.visits),
    total: (t) => totalCell(t.visits, count),
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
    key: 'bench',
    label: 'Bench time',
    numeric: true,
    sortValue: (r) => r.benchMinutes,
    cell: (r) => hoursMinutes(r.benchMinutes),
    total: (t) => totalCell(t.benchMinutes, hoursMinutes),
  },
  {
    key: 'drive',
    label: 'Drive',
    numeric: true,
    sortValue: (r) => r.driveMinutes,
    cell: (r) => hoursMinutes(r.driveMinutes),
    total: (t) => totalCell(t.driveMinutes, hoursMinutes),
  },
  {
    key: 'route',
    label: 'Route time',
    numeric: true,
    sortValue: (r) => r.routeMinutes,
    cell: (r) => hoursMinutes(r.routeMinutes),
    total: (t) => totalCell(t.routeMinutes, hoursMinutes),
  },
  {
    key: 'km',
    label: 'Km',
    numeric: true,
    sortValue: (r) => r.km,
    cell: (r) => decimal(r.km),
    total: (t) => totalCell(t.km, decimal),
  },
  {
    key: 'perRouteHour',
    label: 'Per route hour',
    numeric: true,
    sortValue: (r) => r.perRouteHourCents,
    cell: (r) => moneyOrDash(r.perRouteHourCents),
    total: (t) => totalCell(t.perRouteHourCents, moneyOrDash),
  },
];

/** Each route day's revenue against the day's bench time and drive, latest first. */
export function RouteDaysSection({ params }: { params: ReportParams }) {
  const report = useRouteDaysReport(params);
  return (
    <ReportStates
      query={report}
      what="the revenue per route day"
      chart={false}
      isEmpty={(data) => data.rows.length === 0}
      emptyTitle="No route day was driven in these dates."
    >
      {(data) => (
        <ReportSection
          title="By route day"
          description="Route time is the day's bench time plus its drive."
          actions={<CsvButton name="route-days" params={params} label="Revenue per route day" />}
        >
          <ReportTable
            label="Revenue per route day"
            columns={columns}
            rows={data.rows}
            rowKey={(row) => row.routeDayId}
            totals={data.totals ?? sumsOf(data.rows, ROUTE_DAY_SUMS)}
            totalsLabel="All route days"
            minWidth={1000}
          />
        </ReportSection>
      )}
    </ReportStates>
  );
}
