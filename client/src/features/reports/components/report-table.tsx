import { Group, Table, Text, UnstyledButton } from '@mantine/core';
import { IconArrowDown, IconArrowUp, IconArrowsSort } from '@tabler/icons-react';
import { useMemo, useState, type ReactNode } from 'react';

export interface ReportColumn<Row, Totals = never> {
  key: string;
  label: string;
  /** The cell; figures are right-aligned. */
  cell: (row: Row) => ReactNode;
  /** Where the column can be sorted: the value to sort by (null sorts last). */
  sortValue?: (row: Row) => number | string | null;
  numeric?: boolean;
  /** The totals row's cell for this column, if it has one. */
  total?: (totals: Totals) => ReactNode;
  /** Keeps a name column readable when the table scrolls sideways. */
  minWidth?: number;
}

type Order = 'asc' | 'desc';

interface ReportTableProps<Row, Totals> {
  label: string;
  columns: ReportColumn<Row, Totals>[];
  rows: Row[];
  rowKey: (row: Row) => string;
  totals?: Totals;
  totalsLabel?: string;
  /** Below this width the table scrolls sideways inside its box instead of squeezing. */
  minWidth?: number;
}

function compare(a: number | string | null, b: number | string | null): number {
  if (a === b) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  return typeof a === 'number' && typeof b === 'number' ? a - b : String(a).localeCompare(String(b));
}

/** Sorts on the page: a report's rows all arrive at once. Unsorted, the rows keep the server's order. */
function useSortedRows<Row, Totals>(rows: Row[], columns: ReportColumn<Row, Totals>[]) {
  const [sort, setSort] = useState<{ key: string; order: Order } | null>(null);
  const sorted = useMemo(() => {
    const column = sort && columns.find((candidate) => candidate.key === sort.key);
    if (!sort || !column?.sortValue) return rows;
    const value = column.sortValue;
    const direction = sort.order === 'asc' ? 1 : -1;
    // Nulls stay last either way: a missing figure is not the smallest nor the largest.
    return [...rows].sort((a, b) => {
      const [x, y] = [value(a), value(b)];
      if (x === null || y === null) return compare(x, y);
      return compare(x, y) * direction;
    });
  }, [rows, columns, sort]);

  // Figures start with the largest first, names from A.
  const toggle = (column: ReportColumn<Row, Totals>) =>
    setSort((current) =>
      current?.key === column.key
        ? { key: column.key, order: current.order === 'asc' ? 'desc' : 'asc' }
        : { key: column.key, order: column.numeric ? 'desc' : 'asc' },
    );

  return { sorted, sort, toggle };
}

function SortIcon({ order }: { order: Order | null }) {
  if (order === 'asc') return <IconArrowUp size={14} aria-hidden="true" />;
  if (order === 'desc') return <IconArrowDown size={14} aria-hidden="true" />;
  return <IconArrowsSort size={14} aria-hidden="true" opacity={0.4} />;
}

/** A report's table: sortable by any figure, a totals row at the foot, sideways scrolling on a phone. */
export function ReportTable<Row, Totals = never>({
  label,
  columns,
  rows,
  rowKey,
  totals,
  totalsLabel = 'Total',
  minWidth = 720,
}: ReportTableProps<Row, Totals>) {
  const { sorted, sort, toggle } = useSortedRows(rows, columns);

  return (
    <Table.ScrollContainer minWidth={minWidth}>
      <Table verticalSpacing="xs" highlightOnHover striped="even" stripedColor="gray.0" aria-label={label}>
        <Table.Thead>
          <Table.Tr>
            {columns.map((column) => {
              const order = sort?.key === column.key ? sort.order : null;
              return (
                <Table.Th
                  key={column.key}
                  ta={column.numeric ? 'right' : undefined}
                  miw={column.minWidth}
                  aria-sort={order === 'asc' ? 'ascending' : order === 'desc' ? 'descending' : undefined}
                  style={{ whiteSpace: 'nowrap' }}
                >
                  {column.sortValue ? (
                    <UnstyledButton onClick={() => toggle(column)} fw={600} fz="sm">
                      <Group gap={4} wrap="nowrap" justify={column.numeric ? 'flex-end' : 'flex-start'}>
                        {column.label}
                        <SortIcon order={order} />
                      </Group>
                    </UnstyledButton>
                  ) : (
                    column.label
                  )}
                </Table.Th>
              );
            })}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {sorted.map((row) => (
            <Table.Tr key={rowKey(row)}>
              {columns.map((column) => (
                <Table.Td
                  key={column.key}
                  ta={column.numeric ? 'right' : undefined}
                  style={column.numeric ? { whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' } : undefined}
                >
                  {column.cell(row)}
                </Table.Td>
              ))}
            </Table.Tr>
          ))}
        </Table.Tbody>
        {totals ? (
          <Table.Tfoot>
            <Table.Tr fw={700} style={{ borderTop: '2px solid var(--mantine-color-gray-4)' }}>
              {columns.map((column, index) => (
                <Table.Td
                  key={column.key}
                  ta={column.numeric ? 'right' : undefined}
                  style={{ whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' }}
                >
                  {index === 0 ? <Text fw={700}>{totalsLabel}</Text> : column.total ? column.total(totals) : null}
                </Table.Td>
              ))}
            </Table.Tr>
          </Table.Tfoot>
        ) : null}
      </Table>
    </Table.ScrollContainer>
  );
}
