import { SegmentedControl, Stack, Text } from '@mantine/core';
import { useSearchParams } from 'react-router-dom';
import { oneOf } from '@/features/customers/hooks/use-list-search';
import { formatDay } from '@/lib/format';
import { useReceivablesReport } from '../api/get-receivables-report';
import { CsvButton } from '../components/csv-button';
import { ReceivablesChart } from '../components/receivables-chart';
import { ReceivablesTable } from '../components/receivables-table';
import { ReportPage } from '../components/report-page';
import { ReportSection } from '../components/report-section';
import { ReportStates } from '../components/report-states';
import { useReportFilters } from '../hooks/use-report-filters';
import { RECEIVABLES_GROUPS, type ReceivablesGroup } from '../types';

const GROUP_LABELS: Record<ReceivablesGroup, string> = { customer: 'Per customer', stop: 'Per stop' };

/** What is owed on issued invoices as of the last day of the range, by how long past due. */
export function ReceivablesReportRoute() {
  const filters = useReportFilters();
  const [searchParams, setSearchParams] = useSearchParams();
  const groupBy = oneOf(RECEIVABLES_GROUPS, searchParams.get('groupBy'), 'customer');
  const report = useReceivablesReport(filters.params, groupBy);

  const changeGroup = (value: string) =>
    setSearchParams((previous) => {
      const next = new URLSearchParams(previous);
      if (value === 'customer') next.delete('groupBy');
      else next.set('groupBy', value);
      return next;
    });

  return (
    <ReportPage
      title="What is owed"
      description="Unpaid invoices as of the last day chosen, by how many days past their due date."
      filters={filters}
      showSharpener={false}
      noSharpenerReason="What is owed is for the whole business, as of the last day chosen."
    >
      <SegmentedControl
        value={groupBy}
        onChange={changeGroup}
        data={RECEIVABLES_GROUPS.map((value) => ({ value, label: GROUP_LABELS[value] }))}
        aria-label="Group what is owed"
        data-report-print="hide"
        style={{ alignSelf: 'flex-start' }}
      />
      <ReportStates
        query={report}
        what="what is owed"
        isEmpty={(data) => data.rows.length === 0}
        emptyTitle={`Nothing was owed on ${formatDay(filters.params.to)}.`}
        emptyHint={
          <Text size="sm" c="dimmed" maw={440}>
            Every issued invoice was paid, credited or void by that day.
          </Text>
        }
      >
        {(data) => (
          <Stack gap="md">
            <Text size="sm">
              As of {formatDay(data.asOf)}.{' '}
              {data.groupBy === 'customer'
                ? 'Per bill-to party: a customer, or a stop that pays as a whole.'
                : 'Per stop, whoever the invoice was made out to.'}
            </Text>
            <ReportSection title="Who owes most">
              <ReceivablesChart rows={data.rows} />
            </ReportSection>
            <ReportSection
              title={data.groupBy === 'customer' ? 'Owed per customer' : 'Owed per stop'}
              actions={
                <CsvButton name="receivables" params={filters.params} extra={{ groupBy }} label="What is owed" />
              }
            >
              <ReceivablesTable rows={data.rows} totals={data.totals} groupBy={data.groupBy} />
            </ReportSection>
          </Stack>
        )}
      </ReportStates>
    </ReportPage>
  );
}
