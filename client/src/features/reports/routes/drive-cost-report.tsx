import { Stack, Text } from '@mantine/core';
import { useDriveCostReport } from '../api/get-drive-cost-report';
import { CsvButton } from '../components/csv-button';
import { DriveCostCard } from '../components/drive-cost-card';
import { ReportPage } from '../components/report-page';
import { ReportStates } from '../components/report-states';
import { money } from '../format';
import { useReportFilters } from '../hooks/use-report-filters';

/** The stops that pay least for the drive, and what a planner could change for each. */
export function DriveCostReportRoute() {
  const filters = useReportFilters();
  const report = useDriveCostReport(filters.params);

  return (
    <ReportPage
      title="Stops that pay least for the drive"
      description="The ten stops with the lowest revenue per route hour (two visits or more), with what would help."
      filters={filters}
    >
      <ReportStates
        query={report}
        what="the drive cost report"
        chart={false}
        isEmpty={(data) => data.rows.length === 0}
        emptyTitle="No stop had two visits or more in these dates."
      >
        {(data) => (
          <Stack gap="md">
            <Stack gap={4}>
              {data.medianPerRouteHourCents !== null ? (
                <Text size="sm">
                  Across all stops, the median revenue per route hour is{' '}
                  <Text span fw={700}>
                    {money(data.medianPerRouteHourCents)}
                  </Text>
                  .
                </Text>
              ) : null}
              <Text size="sm" c="dimmed">
                Each change is worked out from the stop&apos;s own figures in these dates: a longer cadence assumes its
                customers keep their shears for the longer gap; a trip charge is rounded up to whole dollars.
              </Text>
            </Stack>
            <Stack gap="sm" component="ol" style={{ listStyle: 'none', padding: 0, margin: 0 }}>
              {data.rows.map((row) => (
                <li key={row.stopId}>
                  <DriveCostCard row={row} median={data.medianPerRouteHourCents} />
                </li>
              ))}
            </Stack>
            <div data-report-print="hide">
              <CsvButton name="drive-cost" params={filters.params} label="Stops that pay least for the drive" />
            </div>
          </Stack>
        )}
      </ReportStates>
    </ReportPage>
  );
}
