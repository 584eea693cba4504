import { Button, Group } from '@mantine/core';
import { Link, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { filtersSearch } from '../hooks/use-report-filters';

// Stop earnings first: PRODUCT.md's owner reads revenue per stop before anything else.
const REPORT_PAGES = [
  { label: 'Revenue per stop', route: paths.reports.stops },
  { label: 'Revenue', route: paths.reports.revenue },
  { label: 'Drive cost', route: paths.reports.driveCost },
  { label: 'Cadence', route: paths.reports.cadence },
  { label: 'What is owed', route: paths.reports.receivables },
] as const;

/** The reports, one click apart; the dates and sharpener go along. */
export function ReportNav() {
  const location = useLocation();
  const search = filtersSearch(new URLSearchParams(location.search));
  return (
    <Group component="nav" aria-label="Reports" gap="xs" data-report-print="hide">
      {REPORT_PAGES.map(({ label, route }) => {
        const current = location.pathname === route.path;
        return (
          <Button
            key={route.path}
            component={Link}
            to={route.getHref(search)}
            variant={current ? 'filled' : 'light'}
            size="sm"
            radius="xl"
            aria-current={current ? 'page' : undefined}
          >
            {label}
          </Button>
        );
      })}
    </Group>
  );
}
