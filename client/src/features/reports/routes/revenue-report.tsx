import { ScrollArea, Tabs } from '@mantine/core';
import { useSearchParams } from 'react-router-dom';
import { oneOf } from '@/features/customers/hooks/use-list-search';
import { LineShareSection } from '../components/line-share-section';
import { MonthsSection } from '../components/months-section';
import { ReportPage } from '../components/report-page';
import { RouteDaysSection } from '../components/route-days-section';
import { SharpenersSection } from '../components/sharpeners-section';
import { useReportFilters } from '../hooks/use-report-filters';

const VIEWS = ['months', 'route-days', 'sharpeners', 'shears'] as const;
type View = (typeof VIEWS)[number];

const VIEW_LABELS: Record<View, string> = {
  months: 'By month',
  'route-days': 'By route day',
  sharpeners: 'By sharpener',
  shears: 'By edge type and tool kind',
};

/** Revenue cut four ways; the chosen cut is in the URL (?view=) with the filters. */
export function RevenueReportRoute() {
  const filters = useReportFilters();
  const [searchParams, setSearchParams] = useSearchParams();
  const view = oneOf(VIEWS, searchParams.get('view'), 'months');

  const changeView = (next: string | null) =>
    setSearchParams((previous) => {
      const params = new URLSearchParams(previous);
      if (!next || next === 'months') params.delete('view');
      else params.set('view', next);
      return params;
    });

  return (
    <ReportPage
      title="Revenue"
      description="The work done by month, route day, sharpener, edge type and tool kind; invoiced and collected by month."
      filters={filters}
    >
      {/* Only the chosen view's figures are fetched: the others mount when chosen. */}
      <Tabs value={view} onChange={changeView} keepMounted={false}>
        <ScrollArea type="never" data-report-print="hide">
          <Tabs.List style={{ flexWrap: 'nowrap' }}>
            {VIEWS.map((option) => (
              <Tabs.Tab key={option} value={option} style={{ whiteSpace: 'nowrap' }}>
                {VIEW_LABELS[option]}
              </Tabs.Tab>
            ))}
          </Tabs.List>
        </ScrollArea>
        <Tabs.Panel value="months" pt="md">
          <MonthsSection params={filters.params} />
        </Tabs.Panel>
        <Tabs.Panel value="route-days" pt="md">
          <RouteDaysSection params={filters.params} />
        </Tabs.Panel>
        <Tabs.Panel value="sharpeners" pt="md">
          <SharpenersSection params={filters.params} />
        </Tabs.Panel>
        <Tabs.Panel value="shears" pt="md">
          <LineShareSection params={filters.params} />
        </Tabs.Panel>
      </Tabs>
    </ReportPage>
  );
}
