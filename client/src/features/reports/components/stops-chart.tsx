import { BarChart } from '@mantine/charts';
import { SegmentedControl, Stack, Text } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { nameAxis } from './axis-labels';
import { useState } from 'react';
import { compactDollars, money } from '../format';
import type { StopRevenueRow } from '../types';

const TOP = 10;

const MEASURES = {
  revenue: { label: 'Revenue', series: 'Revenue', value: (row: StopRevenueRow) => row.revenueCents },
  perRouteHour: {
    label: 'Per route hour',
    series: 'Per route hour',
    value: (row: StopRevenueRow) => row.perRouteHourCents,
  },
} as const;
type Measure = keyof typeof MEASURES;

/** Top stops by the measure, largest first; stops without the figure (no route time) are left out. */
export function topStops(rows: StopRevenueRow[], measure: Measure, top = TOP) {
  const { value, series } = MEASURES[measure];
  return rows
    .filter((row) => value(row) !== null)
    .sort((a, b) => (value(b) ?? 0) - (value(a) ?? 0))
    .slice(0, top)
    .map((row) => ({ stop: row.stopName, [series]: (value(row) ?? 0) / 100 }));
}

/** The stops that bring in most, as bars; switch to revenue per route hour to see which pay for the drive. */
export function StopsChart({ rows }: { rows: StopRevenueRow[] }) {
  const [measure, setMeasure] = useState<Measure>('revenue');
  const phone = useMediaQuery('(max-width: 36em)');
  const data = topStops(rows, measure);
  const { series } = MEASURES[measure];

  return (
    <Stack gap="sm">
      <SegmentedControl
        value={measure}
        onChange={(value) => setMeasure(value as Measure)}
        data={Object.entries(MEASURES).map(([value, { label }]) => ({ value, label }))}
        aria-label="Measure the stops by"
        data-report-print="hide"
        style={{ alignSelf: 'flex-start' }}
      />
      <Text size="sm" c="dimmed">
        Top {data.length} {data.length === 1 ? 'stop' : 'stops'} by{' '}
        {measure === 'revenue' ? 'revenue' : 'revenue per route hour (bench time plus the drive)'}
      </Text>
      <BarChart
        h={Math.max(160, data.length * (phone ? 30 : 34) + 40)}
        data={data}
        dataKey="stop"
        orientation="vertical"
        series={[{ name: series, color: measure === 'revenue' ? 'keenTeal.6' : 'brass.6' }]}
        valueFormatter={(value) => money(Math.round(value * 100))}
        yAxisProps={nameAxis(Boolean(phone))}
        xAxisProps={{ tickFormatter: (value: number) => compactDollars(value) }}
        gridAxis="x"
        barProps={{ radius: 4 }}
        maxBarWidth={26}
        aria-label={`Top stops by ${MEASURES[measure].label.toLowerCase()}`}
      />
    </Stack>
  );
}
