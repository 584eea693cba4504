import { Text } from '@mantine/core';
import { count, money } from '../format';
import type { AgeingFigures, ReceivablesGroup, ReceivablesRow } from '../types';
import { AGE_BUCKETS } from './receivables-chart';
import { ReportTable, type ReportColumn } from './report-table';

function receivableColumns(groupBy: ReceivablesGroup): ReportColumn<ReceivablesRow, AgeingFigures>[] {
  return [
    {
      key: 'name',
      label: groupBy === 'customer' ? 'Who pays' : 'Stop',
      minWidth: 200,
      sortValue: (row) => row.name,
      cell: (row) => (
        <>
          <Text fw={600} size="sm">
            {row.name}
          </Text>
          {row.stopName && row.stopName !== row.name ? (
            <Text size="xs" c="dimmed">
              {row.stopName}
            </Text>
          ) : null}
        </>
      ),
    },
    {
      key: 'total',
      label: 'Total owed',
      numeric: true,
      sortValue: (row) => row.totalCents,
      cell: (row) => (
        <Text fw={700} size="sm">
          {money(row.totalCents)}
        </Text>
      ),
      total: (totals) => money(totals.totalCents),
    },
    {
      key: 'invoices',
      label: 'Invoices',
      numeric: true,
      sortValue: (row) => row.invoices,
      cell: (row) => count(row.invoices),
      total: (totals) => count(totals.invoices),
    },
    ...AGE_BUCKETS.map((bucket): ReportColumn<ReceivablesRow, AgeingFigures> => ({
      key: bucket.key,
      label: bucket.label,
      numeric: true,
      sortValue: (row) => row[bucket.key],
      cell: (row) =>
        row[bucket.key] === 0 ? (
          <Text span c="dimmed" size="sm">
            {money(0)}
          </Text>
        ) : (
          money(row[bucket.key])
        ),
      total: (totals) => money(totals[bucket.key]),
    })),
  ];
}

export function ReceivablesTable({
  rows,
  totals,
  groupBy,
}: {
  rows: ReceivablesRow[];
  totals?: AgeingFigures;
  groupBy: ReceivablesGroup;
}) {
  return (
    <ReportTable
      label="What is owed"
      columns={receivableColumns(groupBy)}
      rows={rows}
      rowKey={(row) => row.key}
      totals={totals}
      totalsLabel="Everyone"
      minWidth={940}
    />
  );
}
