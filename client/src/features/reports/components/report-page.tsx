import '@mantine/charts/styles.css';
import './report-print.css';
import { Button, Stack, Text } from '@mantine/core';
import { IconPrinter } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { PageHeader } from '@/components/page-header';
import { useStaff } from '@/features/stops/api/get-staff';
import { formatDay } from '@/lib/format';
import type { ReportFilters } from '../hooks/use-report-filters';
import { ReportFilterBar } from './report-filters';
import { ReportNav } from './report-nav';

interface ReportPageProps {
  title: string;
  description: ReactNode;
  filters: ReportFilters;
  showSharpener?: boolean;
  noSharpenerReason?: string;
  children: ReactNode;
}

/**
 * Every report page: its title, the other reports, the filter bar and Print. The charts' styles load with the reports
 * only, so the first page of the app does not carry them.
 */
export function ReportPage({
  title,
  description,
  filters,
  showSharpener = true,
  noSharpenerReason,
  children,
}: ReportPageProps) {
  const { from, to, sharpenerId } = filters.params;
  const staff = useStaff({ enabled: showSharpener });
  const sharpener = showSharpener && sharpenerId ? staff.data?.find((person) => person.id === sharpenerId) : null;
  return (
    <Stack gap="md" maw={1280} data-report-page="">
      <PageHeader
        title={title}
        description={description}
        actions={
          <Button
            variant="default"
            leftSection={<IconPrinter size={18} aria-hidden="true" />}
            onClick={() => window.print()}
            data-report-print="hide"
          >
            Print
          </Button>
        }
      />
      <ReportNav />
      <ReportFilterBar filters={filters} showSharpener={showSharpener} noSharpenerReason={noSharpenerReason} />
      {/* On paper the filter bar is gone, so the period is said in a line. */}
      <Text size="sm" c="dimmed" aria-live="polite">
        {formatDay(from)} to {formatDay(to)}
        {sharpener ? ` · ${sharpener.name}'s work` : ''}
      </Text>
      {children}
    </Stack>
  );
}
