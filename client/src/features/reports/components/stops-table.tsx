import { Anchor, Text } from '@mantine/core';
import { count, decimal, hoursMinutes, money, moneyOrDash } from '../format';
import type { StopFigures, StopRevenueRow } from '../types';
import { ReportTable, type ReportColumn } from './report-table';

function stopColumns(onOpenStop: (row: StopRevenueRow) => void): ReportColumn<StopRevenueRow, StopFigures>[] {
  return [
    {
      key: 'stop',
      label: 'Stop',
      minWidth: 200,
      sortValue: (row) => row.stopName,
      cell: (row) => (
        <>
          <Anchor component="button" type="button" fw={600} ta="left" onClick={() => onOpenStop(row)}>
            {row.stopName}
          </Anchor>
          <Text size="xs" c="dimmed">
            {row.city}
          </Text>
        </>
      ),
    },
    {
      key: 'cadence',
      label: 'Cadence',
      numeric: true,
      sortValue: (row) => row.cadenceWeeks,
      cell: (row) => `${row.cadenceWeeks} wk`,
    },
    {
      key: 'visits',
      label: 'Visits',
      numeric: true,
      sortValue: (row) => row.visits,
      cell: (row) => count(row.visits),
      total: (totals) => count(totals.visits),
    },
    {
      key: 'shears',
      label: 'Shears',
      numeric: true,
      sortValue: (row) => row.shears,
      cell: (row) => count(row.shears),
      total: (totals) => count(totals.shears),
    },
    {
      key: 'revenue',
      label: 'Revenue',
      numeric: true,
      sortValue: (row) => row.revenueCents,
      cell: (row) => <Text fw={600}>{money(row.revenueCents)}</Text>,
      total: (totals) => money(totals.revenueCents),
    },
    {
      key: 'bench',
      label: 'Bench time',
      numeric: true,
      sortValue: (row) => row.benchMinutes,
      cell: (row) => hoursMinutes(row.benchMinutes),
      total: (totals) => hoursMinutes(totals.benchMinutes),
    },
    {
      key: 'drive',
      label: 'Drive',
      numeric: true,
      sortValue: (row) => row.driveMinutes,
      cell: (row) => hoursMinutes(row.driveMinutes),
      total: (totals) => hoursMinutes(totals.driveMinutes),
    },
    {
      key: 'route',
      label: 'Route time',
      numeric: true,
      sortValue: (row) => row.routeMinutes,
      cell: (row) => hoursMinutes(row.routeMinutes),
      total: (totals) => hoursMinutes(totals.routeMinutes),
    },
    {
      key: 'km',
      label: 'Km',
      numeric: true,
      sortValue: (row) => row.km,
      cell: (row) => decimal(row.km),
      total: (totals) => decimal(totals.km),
    },
    {
      key: 'perVisit',
      label: 'Per visit',
      numeric: true,
      sortValue: (row) => row.perVisitCents,
      cell: (row) => moneyOrDash(row.perVisitCents),
      total: (totals) => moneyOrDash(totals.perVisitCents),
    },
    {
      key: 'perBenchHour',
      label: 'Per bench hour',
      numeric: true,
      sortValue: (row) => row.perBenchHourCents,
      cell: (row) => moneyOrDash(row.perBenchHourCents),
      total: (totals) => moneyOrDash(totals.perBenchHourCents),
    },
    {
      key: 'perRouteHour',
      label: 'Per route hour',
      numeric: true,
      sortValue: (row) => row.perRouteHourCents,
      cell: (row) => <Text fw={600}>{moneyOrDash(row.perRouteHourCents)}</Text>,
      total: (totals) => moneyOrDash(totals.perRouteHourCents),
    },
    {
      key: 'perKm',
      label: 'Per km',
      numeric: true,
      sortValue: (row) => row.perKmCents,
      cell: (row) => moneyOrDash(row.perKmCents),
      total: (totals) => moneyOrDash(totals.perKmCents),
    },
    {
      key: 'shearsPerVisit',
      label: 'Shears per visit',
      numeric: true,
      sortValue: (row) => row.shearsPerVisit,
      cell: (row) => decimal(row.shearsPerVisit),
      total: (totals) => decimal(totals.shearsPerVisit),
    },
  ];
}

interface StopsTableProps {
  rows: StopRevenueRow[];
  totals?: StopFigures;
  onOpenStop: (row: StopRevenueRow) => void;
}

/** Every stop's revenue against the time and distance it took; a stop's name opens its monthly trend. */
export function StopsTable({ rows, totals, onOpenStop }: StopsTableProps) {
  return (
    <ReportTable
      label="Revenue per stop"
      columns={stopColumns(onOpenStop)}
      rows={rows}
      rowKey={(row) => row.stopId}
      totals={totals}
      totalsLabel="All stops"
      minWidth={1240}
    />
  );
}
