import { Chip, Group, Paper, Stack, Text } from '@mantine/core';
import { DatePickerInput } from '@mantine/dates';
import { useMediaQuery } from '@mantine/hooks';
import { IconCalendar } from '@tabler/icons-react';
import { useEffect, useState } from 'react';
import { SharpenerSelect } from '@/features/stops/components/sharpener-select';
import type { ReportFilters } from '../hooks/use-report-filters';
import { PERIOD_LABELS, REPORT_PERIODS, periodOf, periodRange, type ReportPeriod } from '../periods';

type DraftRange = [string | null, string | null];

interface ReportFilterBarProps {
  filters: ReportFilters;
  /** The receivables report is as of a day and for everyone: it has no use for the start or the sharpener. */
  showSharpener?: boolean;
  noSharpenerReason?: string;
}

/** The dates (a named period or any two days) and the sharpener, the same on every report page. */
export function ReportFilterBar({ filters, showSharpener = true, noSharpenerReason }: ReportFilterBarProps) {
  const { params, today, setRange, setSharpener } = filters;
  const twoMonths = useMediaQuery('(min-width: 48em)');
  // Picking a range takes two clicks: the first day waits here until the last one is picked.
  const [draft, setDraft] = useState<DraftRange>([params.from, params.to]);
  useEffect(() => setDraft([params.from, params.to]), [params.from, params.to]);
  const period = periodOf(params, today);

  const changeDates = (value: DraftRange) => {
    setDraft(value);
    const [from, to] = value;
    if (from && to) setRange({ from, to });
  };

  return (
    <Paper withBorder radius="lg" p="md" data-report-print="hide" role="search" aria-label="Report filters">
      <Stack gap="sm">
        <Chip.Group value={period ?? ''} onChange={(value) => setRange(periodRange(value as ReportPeriod, today))}>
          <Group gap="xs" role="radiogroup" aria-label="Period">
            {REPORT_PERIODS.map((option) => (
              <Chip key={option} value={option} size="sm">
                {PERIOD_LABELS[option]}
              </Chip>
            ))}
          </Group>
        </Chip.Group>
        <Group gap="md" align="flex-end" wrap="wrap">
          <DatePickerInput
            type="range"
            label="Dates"
            value={draft}
            onChange={changeDates}
            allowSingleDateInRange
            numberOfColumns={twoMonths ? 2 : 1}
            valueFormat="MMM D, YYYY"
            size="md"
            leftSection={<IconCalendar size={18} aria-hidden="true" />}
            style={{ flex: '1 1 18rem' }}
            maw={360}
          />
          {showSharpener ? (
            <SharpenerSelect
              label="Sharpener"
              placeholder="Every sharpener"
              value={params.sharpenerId ?? null}
              onChange={setSharpener}
              style={{ flex: '1 1 14rem' }}
              maw={300}
            />
          ) : noSharpenerReason ? (
            <Text size="sm" c="dimmed" style={{ flex: '1 1 14rem' }} pb={8}>
              {noSharpenerReason}
            </Text>
          ) : null}
        </Group>
      </Stack>
    </Paper>
  );
}
