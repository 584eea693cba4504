import { Button, Group, Modal, Stack, Text, Textarea } from '@mantine/core';
import { useState } from 'react';
import type { Invoice } from '../types';
import type { InvoiceAction } from './invoice-action';

/** Voiding keeps the invoice and its number, with the reason; its tickets can go on another invoice. */
export function VoidModal({
  invoice,
  opened,
  onClose,
  run,
}: {
  invoice: Invoice;
  opened: boolean;
  onClose: () => void;
  run: InvoiceAction;
}) {
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);

  const submit = async (event: React.FormEvent) => {
    event.preventDefault();
    const text = reason.trim();
    if (text.length < 3) {
      setProblem('Say why it is void, for the record.');
      return;
    }
    setProblem(null);
    setSaving(true);
    const ok = await run({ kind: 'void', reason: text }, `${invoice.number ?? 'The invoice'} is void`);
    setSaving(false);
    if (ok) onClose();
  };

  return (
    <Modal opened={opened} onClose={onClose} title={`Void ${invoice.number ?? 'the invoice'}`} centered>
      <form onSubmit={(event) => void submit(event)} noValidate>
        <Stack gap="md">
          <Text size="sm">
            A void invoice keeps its number and shows as void; nothing is owed on it. Its tickets go back to the ones
            waiting for an invoice. Where the customer has paid against it, make a credit note instead.
          </Text>
          <Textarea
            label="Reason"
            required
            rows={2}
            maxLength={500}
            value={reason}
            onChange={(event) => setReason(event.currentTarget.value)}
            error={problem}
          />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={onClose}>
              Keep it
            </Button>
            <Button type="submit" color="red" loading={saving}>
              Void the invoice
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
