import { Button, Group, Modal, Select, Stack, Text, TextInput, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { centsToField, readAmount } from '../amount-field';
import { money, REFUND_METHOD_LABELS } from '../labels';
import { REFUND_METHODS, type Invoice, type RefundMethod } from '../types';
import type { InvoiceAction } from './invoice-action';

interface CreditValues {
  amount: string;
  reason: string;
  refundMethod: RefundMethod;
}

interface CreditNoteModalProps {
  invoice: Invoice;
  opened: boolean;
  onClose: () => void;
  run: InvoiceAction;
}

/** A sent invoice is never changed: a credit note takes an amount off it, with a reason, and says how it was refunded. */
export function CreditNoteModal({ invoice, opened, onClose, run }: CreditNoteModalProps) {
  const { currency } = invoice;
  const creditable = Math.max(0, invoice.totalCents - invoice.creditedCents);
  const [saving, setSaving] = useState(false);
  const tooMuch = `A credit note can be at most ${money(creditable, currency)} (the total less earlier credit notes).`;
  const form = useForm<CreditValues>({
    initialValues: {
      amount: centsToField(Math.min(creditable, invoice.balanceCents || creditable), currency),
      reason: '',
      refundMethod: invoice.paidCents > 0 ? 'cash' : 'none',
    },
    validate: {
      amount: (value) => {
        const read = readAmount(value, currency, creditable, tooMuch);
        return 'error' in read ? read.error : null;
      },
      reason: (value) => (value.trim().length >= 3 ? null : 'Say why, for the record and the customer.'),
    },
  });

  const submit = form.onSubmit(async (values) => {
    const read = readAmount(values.amount, currency, creditable, tooMuch);
    if ('error' in read) return;
    setSaving(true);
    const ok = await run(
      {
        kind: 'credit-note',
        input: { amountCents: read.cents, reason: values.reason.trim(), refundMethod: values.refundMethod },
      },
      `Credit note for ${money(read.cents, currency)} made`,
    );
    setSaving(false);
    if (ok) onClose();
  });

  return (
    <Modal opened={opened} onClose={onClose} title="Credit note" centered>
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text size="sm" c="dimmed">
            It gets its own number (CN-…) and lowers what is owed. Where money goes back, record how.
          </Text>
          <TextInput label="Amount" inputMode="decimal" required {...form.getInputProps('amount')} />
          <Textarea label="Reason" required rows={2} maxLength={500} {...form.getInputProps('reason')} />
          <Select
            label="Refund"
            data={REFUND_METHODS.map((value) => ({ value, label: REFUND_METHOD_LABELS[value] }))}
            allowDeselect={false}
            comboboxProps={{ withinPortal: true }}
            {...form.getInputProps('refundMethod')}
          />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" loading={saving}>
              Make the credit note
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
