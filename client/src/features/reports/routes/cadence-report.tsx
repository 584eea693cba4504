import { Anchor, Stack, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useCadenceReport } from '../api/get-cadence-report';
import { CsvButton } from '../components/csv-button';
import { ReportPage } from '../components/report-page';
import { ReportSection } from '../components/report-section';
import { ReportStates } from '../components/report-states';
import { ReportTable, type ReportColumn } from '../components/report-table';
import { count, decimal, onTimeShare } from '../format';
import { useReportFilters } from '../hooks/use-report-filters';
import type { CadenceRow, CadenceSharpenerRow } from '../types';

const days = (value: number) => (value === 1 ? '1 day' : `${count(value)} days`);

const sharpenerName = (name: string | null) =>
  name ?? (
    <Text span c="dimmed" size="sm">
      No sharpener named
    </Text>
  );

const onTimeColumns: ReportColumn<CadenceSharpenerRow>[] = [
  {
    key: 'sharpener',
    label: 'Sharpener',
    minWidth: 160,
    sortValue: (r) => r.sharpenerName,
    cell: (r) => sharpenerName(r.sharpenerName),
  },
  { key: 'visits', label: 'Visits', numeric: true, sortValue: (r) => r.visits, cell: (r) => count(r.visits) },
  { key: 'onTime', label: 'On time', numeric: true, sortValue: (r) => r.onTime, cell: (r) => count(r.onTime) },
  { key: 'late', label: 'Late', numeric: true, sortValue: (r) => r.late, cell: (r) => count(r.late) },
  {
    key: 'share',
    label: 'On time share',
    numeric: true,
    sortValue: (r) => (r.onTime + r.late === 0 ? null : r.onTime / (r.onTime + r.late)),
    cell: (r) => onTimeShare(r.onTime, r.late),
  },
];

const stopColumns: ReportColumn<CadenceRow>[] = [
  {
    key: 'stop',
    label: 'Stop',
    minWidth: 200,
    sortValue: (r) => r.stopName,
    cell: (r) => (
      <Anchor component={Link} to={paths.stops.detail.getHref(r.stopId)} fw={600} size="sm">
        {r.stopName}
      </Anchor>
    ),
  },
  {
    key: 'sharpener',
    label: 'Sharpener',
    sortValue: (r) => r.sharpenerName,
    cell: (r) => sharpenerName(r.sharpenerName),
  },
  {
    key: 'cadence',
    label: 'Cadence',
    numeric: true,
    sortValue: (r) => r.cadenceWeeks,
    cell: (r) => `${r.cadenceWeeks} wk`,
  },
  { key: 'visits', label: 'Visits', numeric: true, sortValue: (r) => r.visits, cell: (r) => count(r.visits) },
  { key: 'onTime', label: 'On time', numeric: true, sortValue: (r) => r.onTime, cell: (r) => count(r.onTime) },
  {
    key: 'late',
    label: 'Late',
    numeric: true,
    sortValue: (r) => r.late,
    cell: (r) =>
      r.late > 0 ? (
        <Text span c="red.8" fw={600} size="sm">
          {count(r.late)}
        </Text>
      ) : (
        count(r.late)
      ),
  },
  {
    key: 'gap',
    label: 'Average gap',
    numeric: true,
    sortValue: (r) => r.averageGapDays,
    cell: (r) => (r.averageGapDays === null ? '—' : `${decimal(r.averageGapDays)} d`),
  },
  {
    key: 'worst',
    label: 'Latest by',
    numeric: true,
    sortValue: (r) => r.worstLateDays,
    cell: (r) => (r.worstLateDays > 0 ? days(r.worstLateDays) : '—'),
  },
];

/** Whether stops were visited on their cadence: per sharpener in short, then per stop. */
export function CadenceReportRoute() {
  const filters = useReportFilters();
  const report = useCadenceReport(filters.params);

  return (
    <ReportPage
      title="Cadence kept"
      description="Visits on time and late against each stop's cadence."
      filters={filters}
    >
      <ReportStates
        query={report}
        what="the cadence report"
        chart={false}
        isEmpty={(data) => data.rows.length === 0}
        emptyTitle="No stop was visited in these dates."
      >
        {(data) => (
          <Stack gap="md">
            <Text size="sm">
              A visit is late when more than the stop&apos;s cadence plus {days(data.graceDays)} of grace has passed
              since the visit before. A stop&apos;s first visit ever is neither on time nor late; it counts in visits
              only.
            </Text>
            <ReportSection
              title="Per sharpener"
              actions={
                <CsvButton
                  name="cadence"
                  params={filters.params}
                  extra={{ groupBy: 'sharpener' }}
                  label="On time per sharpener"
                />
              }
            >
              <ReportTable
                label="On time per sharpener"
                columns={onTimeColumns}
                rows={data.bySharpener}
                rowKey={(row) => row.sharpenerId ?? 'none'}
                minWidth={520}
              />
            </ReportSection>
            <ReportSection
              title="Per stop"
              description="Average gap is the days between visits; latest by is the most days a visit came after it was due."
              actions={<CsvButton name="cadence" params={filters.params} label="On time per stop" />}
            >
              <ReportTable
                label="On time per stop"
                columns={stopColumns}
                rows={data.rows}
                // A stop worked by two sharpeners in the range has a row for each.
                rowKey={(row) => `${row.stopId}:${row.sharpenerId ?? 'none'}`}
                minWidth={900}
              />
            </ReportSection>
          </Stack>
        )}
      </ReportStates>
    </ReportPage>
  );
}
