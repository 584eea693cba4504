import { Stack, Text } from '@mantine/core';
import { useCallback } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useStopsReport } from '../api/get-stops-report';
import { CsvButton } from '../components/csv-button';
import { ReportPage } from '../components/report-page';
import { ReportSection } from '../components/report-section';
import { ReportStates } from '../components/report-states';
import { StopTrendDrawer } from '../components/stop-trend-drawer';
import { StopsChart } from '../components/stops-chart';
import { StopsTable } from '../components/stops-table';
import { useReportFilters } from '../hooks/use-report-filters';
import type { StopRevenueRow } from '../types';

/** The stop whose monthly trend is open lives in the URL too (?stop=), so the link opens the same drawer. */
function useOpenStop() {
  const [searchParams, setSearchParams] = useSearchParams();
  const stopId = searchParams.get('stop');
  const setStop = useCallback(
    (id: string | null) =>
      setSearchParams((previous) => {
        const next = new URLSearchParams(previous);
        if (id) next.set('stop', id);
        else next.delete('stop');
        return next;
      }),
    [setSearchParams],
  );
  return { stopId, setStop };
}

/** Stop earnings: what each stop brings in, per visit, per bench hour and per route hour with the drive counted. */
export function StopsReportRoute() {
  const filters = useReportFilters();
  const report = useStopsReport(filters.params);
  const { stopId, setStop } = useOpenStop();
  const openRow = report.data?.rows.find((row) => row.stopId === stopId) ?? null;
  const openStop = useCallback((row: StopRevenueRow) => setStop(row.stopId), [setStop]);

  return (
    <ReportPage
      title="Revenue per stop"
      description="What each stop brings in, per visit, per bench hour and per route hour with its share of the drive."
      filters={filters}
    >
      <ReportStates
        query={report}
        what="the revenue per stop"
        isEmpty={(data) => data.rows.length === 0}
        emptyTitle="No stop was visited in these dates."
      >
        {(data) => (
          <Stack gap="md">
            <ReportSection title="Top stops">
              <StopsChart rows={data.rows} />
            </ReportSection>
            <ReportSection
              title="Every stop"
              description={
                <>
                  Route time is the bench time plus the stop&apos;s share of its route days&apos; drive. Choose a stop
                  to see its months.
                </>
              }
              actions={<CsvButton name="stops" params={filters.params} label="Revenue per stop" />}
            >
              <StopsTable rows={data.rows} totals={data.totals} onOpenStop={openStop} />
              <Text size="xs" c="dimmed">
                A dash means the figure has nothing to divide by (no visits, no time or no distance).
              </Text>
            </ReportSection>
          </Stack>
        )}
      </ReportStates>
      <StopTrendDrawer
        stop={stopId && report.data ? (openRow ?? { stopId, stopName: 'This stop' }) : null}
        params={filters.params}
        onClose={() => setStop(null)}
      />
    </ReportPage>
  );
}
