import { BarChart } from '@mantine/charts';
import { useMediaQuery } from '@mantine/hooks';
import { nameAxis } from './axis-labels';
import { compactDollars, money } from '../format';
import type { ReceivablesRow } from '../types';

export const AGE_BUCKETS = [
  { key: 'currentCents', label: 'Not yet due', color: 'keenTeal.3' },
  { key: 'days1to30Cents', label: '1–30 days', color: 'keenTeal.6' },
  { key: 'days31to60Cents', label: '31–60 days', color: 'brass.4' },
  { key: 'days61to90Cents', label: '61–90 days', color: 'brass.7' },
  { key: 'over90Cents', label: 'Over 90 days', color: 'red.7' },
] as const satisfies readonly { key: keyof ReceivablesRow; label: string; color: string }[];

const TOP = 10;

/** Who owes most, each bar split by how long past due; the rows come largest first. */
export function ReceivablesChart({ rows }: { rows: ReceivablesRow[] }) {
  const phone = useMediaQuery('(max-width: 36em)');
  const top = rows.slice(0, TOP);
  const data = top.map((row) => ({
    name: row.name,
    ...Object.fromEntries(AGE_BUCKETS.map((bucket) => [bucket.label, row[bucket.key] / 100])),
  }));
  return (
    <BarChart
      h={Math.max(160, top.length * (phone ? 30 : 34) + 70)}
      data={data}
      dataKey="name"
      type="stacked"
      orientation="vertical"
      series={AGE_BUCKETS.map((bucket) => ({ name: bucket.label, color: bucket.color }))}
      valueFormatter={(value) => money(Math.round(value * 100))}
      yAxisProps={nameAxis(Boolean(phone))}
      xAxisProps={{ tickFormatter: (value: number) => compactDollars(value) }}
      withLegend
      // Oldest debt last, as in the table; recharts would sort the legend by name.
      legendProps={{ verticalAlign: 'bottom', itemSorter: null }}
      maxBarWidth={26}
      aria-label="What is owed, by age"
    />
  );
}
