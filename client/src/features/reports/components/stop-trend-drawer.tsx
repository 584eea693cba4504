import { LineChart } from '@mantine/charts';
import { Anchor, Drawer, Stack, Text } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useMonthsReport } from '../api/get-months-report';
import { compactDollars, count, formatMonth, formatShortMonth, money, moneyOrDash } from '../format';
import type { MonthRow, ReportParams } from '../types';
import { CsvButton } from './csv-button';
import { MONTH_SUMS } from './months-section';
import { ReportStates } from './report-states';
import { ReportTable, type ReportColumn } from './report-table';
import { sumsOf, totalCell } from '../totals';

const columns: ReportColumn<MonthRow, Partial<Omit<MonthRow, 'month'>>>[] = [
  { key: 'month', label: 'Month', cell: (row) => formatMonth(row.month), sortValue: (row) => row.month },
  {
    key: 'visits',
    label: 'Visits',
    numeric: true,
    cell: (row) => count(row.visits),
    total: (totals) => totalCell(totals.visits, count),
  },
  {
    key: 'shears',
    label: 'Shears',
    numeric: true,
    cell: (row) => count(row.shears),
    total: (totals) => totalCell(totals.shears, count),
  },
  {
    key: 'revenue',
    label: 'Revenue',
    numeric: true,
    cell: (row) => money(row.revenueCents),
    total: (totals) => totalCell(totals.revenueCents, money),
  },
  {
    key: 'perVisit',
    label: 'Per visit',
    numeric: true,
    cell: (row) => moneyOrDash(row.perVisitCents),
    total: (totals) => totalCell(totals.perVisitCents, moneyOrDash),
  },
];

interface StopTrendDrawerProps {
  stop: { stopId: string; stopName: string } | null;
  params: ReportParams;
  onClose: () => void;
}

/** One stop's revenue month by month over the report's range, months without a visit included. */
export function StopTrendDrawer({ stop, params, onClose }: StopTrendDrawerProps) {
  const phone = useMediaQuery('(max-width: 36em)');
  const trend = useMonthsReport(params, { stopId: stop?.stopId, enabled: stop !== null });
  return (
    <Drawer
      opened={stop !== null}
      onClose={onClose}
      position="right"
      size={phone ? '100%' : 'xl'}
      title={stop ? `${stop.stopName}: revenue by month` : ''}
      closeButtonProps={{ 'aria-label': 'Close the trend' }}
      data-report-print="hide"
    >
      {stop ? (
        <Stack gap="md">
          <Anchor component={Link} to={paths.stops.detail.getHref(stop.stopId)} size="sm">
            Open the stop
          </Anchor>
          <ReportStates
            query={trend}
            what="the stop's trend"
            isEmpty={(data) => data.rows.every((row) => row.visits === 0 && row.revenueCents === 0)}
            emptyTitle="No visits to this stop in these dates."
          >
            {(data) => (
              <>
                <LineChart
                  h={220}
                  data={data.rows.map((row) => ({
                    month: formatShortMonth(row.month),
                    Revenue: row.revenueCents / 100,
                  }))}
                  dataKey="month"
                  series={[{ name: 'Revenue', color: 'keenTeal.6' }]}
                  valueFormatter={(value) => money(Math.round(value * 100))}
                  yAxisProps={{ tickFormatter: (value: number) => compactDollars(value), width: 56 }}
                  curveType="linear"
                  aria-label={`${stop.stopName}: revenue by month`}
                />
                <Text size="sm" c="dimmed">
                  Invoices go to whoever pays, so a single stop's trend shows the work done, not what was billed.
                </Text>
                <ReportTable
                  label={`${stop.stopName} by month`}
                  columns={columns}
                  rows={data.rows}
                  rowKey={(row) => row.month}
                  totals={data.totals ?? sumsOf(data.rows, MONTH_SUMS)}
                  minWidth={420}
                />
                <CsvButton
                  name="months"
                  params={params}
                  extra={{ stopId: stop.stopId }}
                  label={`${stop.stopName} by month`}
                />
              </>
            )}
          </ReportStates>
        </Stack>
      ) : null}
    </Drawer>
  );
}
