import { Button } from '@mantine/core';
import { IconFileSpreadsheet } from '@tabler/icons-react';
import { useReportCsv } from '../api/download-report-csv';
import type { ReportExtra } from '../api/keys';
import type { ReportName, ReportParams } from '../types';

interface CsvButtonProps {
  name: ReportName;
  params: ReportParams;
  extra?: ReportExtra;
  /** Where a page has several tables, which one the file is. */
  label?: string;
}

/** The table's figures as a CSV file, for the same dates and sharpener as on screen. */
export function CsvButton({ name, params, extra, label }: CsvButtonProps) {
  const csv = useReportCsv();
  return (
    <Button
      variant="default"
      size="sm"
      data-report-print="hide"
      leftSection={<IconFileSpreadsheet size={16} aria-hidden="true" />}
      loading={csv.isPending}
      onClick={() => csv.mutate({ name, params, extra })}
      aria-label={label ? `Download CSV: ${label}` : undefined}
    >
      Download CSV
    </Button>
  );
}
