import { Button, Group, Modal, Stack, Text, TextInput } from '@mantine/core';
import { useState } from 'react';
import type { Invoice } from '../types';
import type { InvoiceAction } from './invoice-action';

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** E-mails the PDF with the pay link; a draft is issued first. The address starts as the one on the invoice. */
export function SendModal({
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
  const [to, setTo] = useState(invoice.billToEmail ?? '');
  const [problem, setProblem] = useState<string | null>(null);
  const [sending, setSending] = useState(false);
  const resend = invoice.sentAt !== null;

  const submit = async (event: React.FormEvent) => {
    event.preventDefault();
    const address = to.trim();
    if (!EMAIL.test(address)) {
      setProblem('Write an e-mail address like name@example.com.');
      return;
    }
    setProblem(null);
    setSending(true);
    // The server queues the e-mail; the send log shows when it went.
    const ok = await run({ kind: 'send', to: address }, resend ? 'Queued to send again' : 'Invoice queued to send');
    setSending(false);
    if (ok) onClose();
  };

  return (
    <Modal opened={opened} onClose={onClose} title={resend ? 'Send the invoice again' : 'Send the invoice'} centered>
      <form onSubmit={(event) => void submit(event)} noValidate>
        <Stack gap="md">
          {invoice.status === 'draft' ? (
            <Text size="sm">
              Sending issues the draft first: it gets its number and due date, and can no longer be deleted.
            </Text>
          ) : null}
          <Text size="sm" c="dimmed">
            The e-mail carries the PDF and, while something is owed, the link to pay online.
          </Text>
          <TextInput
            label="To"
            type="email"
            autoComplete="email"
            required
            value={to}
            onChange={(event) => setTo(event.currentTarget.value)}
            error={problem}
          />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" loading={sending}>
              {invoice.status === 'draft' ? 'Issue and send' : resend ? 'Send again' : 'Send'}
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
