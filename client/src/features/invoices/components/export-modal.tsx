import { Button, Group, Modal, Stack, Text, TextInput } from '@mantine/core';
import { IconFileSpreadsheet } from '@tabler/icons-react';
import { useState } from 'react';
import { todayIso } from '@/features/stops/format';
import { useCsvExport, type CsvExportKind } from '../api/export-csv';
import { rangeProblem } from '../date-range';

/** The invoices or the payments of a period as CSV files for the books; fetched with the sign-in, then saved. */
export function ExportModal({ opened, onClose }: { opened: boolean; onClose: () => void }) {
  const today = todayIso();
  const [from, setFrom] = useState(`${today.slice(0, 8)}01`);
  const [to, setTo] = useState(today);
  const exporter = useCsvExport();
  const problem = rangeProblem(from, to);

  const download = (kind: CsvExportKind) => exporter.mutate({ kind, range: { from, to } });
  const busy = exporter.isPending ? exporter.variables.kind : null;

  return (
    <Modal opened={opened} onClose={onClose} title="Export for the books" centered>
      <Stack gap="md">
        <Text size="sm" c="dimmed">
          Choose the period, then the file: a CSV opens in any spreadsheet program. Amounts are plain numbers like
          48.30.
        </Text>
        <Group grow gap="sm" align="flex-start">
          <TextInput type="date" label="From" value={from} onChange={(event) => setFrom(event.currentTarget.value)} />
          <TextInput type="date" label="To" value={to} onChange={(event) => setTo(event.currentTarget.value)} />
        </Group>
        {problem ? (
          <Text size="sm" c="red" role="alert">
            {problem}
          </Text>
        ) : null}
        <Stack gap="sm">
          <Button
            leftSection={<IconFileSpreadsheet size={18} aria-hidden="true" />}
            disabled={problem !== null || (busy !== null && busy !== 'invoices')}
            loading={busy === 'invoices'}
            onClick={() => download('invoices')}
          >
            Invoices CSV
          </Button>
          <Button
            variant="default"
            leftSection={<IconFileSpreadsheet size={18} aria-hidden="true" />}
            disabled={problem !== null || (busy !== null && busy !== 'payments')}
            loading={busy === 'payments'}
            onClick={() => download('payments')}
          >
            Payments CSV
          </Button>
        </Stack>
      </Stack>
    </Modal>
  );
}
