import { Button, Group, Modal, Stack, Text, TextInput } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconFileText } from '@tabler/icons-react';
import { useState } from 'react';
import { todayIso } from '@/features/stops/format';
import { useStatementPdf, type StatementSubject } from '../api/get-statement';
import { rangeProblem, yearToDate } from '../date-range';

/**
 * "Statement (PDF)": the invoices, payments and credit notes of one customer or stop over a period, with the opening
 * and closing balance. The period starts at 1 January of this year, which answers the usual "what do I still owe".
 */
export function StatementButton({ subject }: { subject: StatementSubject }) {
  const [opened, modal] = useDisclosure(false);
  return (
    <>
      <Button variant="default" leftSection={<IconFileText size={18} aria-hidden="true" />} onClick={modal.open}>
        Statement (PDF)
      </Button>
      {/* Mounted only while open, so each opening starts again from this year to today. */}
      {opened ? <StatementModal subject={subject} onClose={modal.close} /> : null}
    </>
  );
}

function StatementModal({ subject, onClose }: { subject: StatementSubject; onClose: () => void }) {
  const [range, setRange] = useState(() => yearToDate(todayIso()));
  const statement = useStatementPdf();
  const problem = rangeProblem(range.from, range.to);

  return (
    <Modal opened onClose={onClose} title="Statement of account" centered>
      <Stack gap="md">
        <Text size="sm" c="dimmed">
          For {subject.name}: the invoices of the period, what was paid and credited, and the balance at its start and
          end.
        </Text>
        <Group grow gap="sm" align="flex-start">
          <TextInput
            type="date"
            label="From"
            value={range.from}
            onChange={(event) => setRange({ ...range, from: event.currentTarget.value })}
          />
          <TextInput
            type="date"
            label="To"
            value={range.to}
            onChange={(event) => setRange({ ...range, to: event.currentTarget.value })}
          />
        </Group>
        {problem ? (
          <Text size="sm" c="red" role="alert">
            {problem}
          </Text>
        ) : null}
        <Button
          leftSection={<IconFileText size={18} aria-hidden="true" />}
          disabled={problem !== null}
          loading={statement.isPending}
          onClick={() => statement.mutate({ subject, range })}
        >
          Get statement
        </Button>
      </Stack>
    </Modal>
  );
}
