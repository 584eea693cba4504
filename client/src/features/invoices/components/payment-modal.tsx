import { Button, Checkbox, Group, Modal, SegmentedControl, Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useState } from 'react';
import { centsToField, readAmount } from '../amount-field';
import { money, PAYMENT_METHOD_LABELS } from '../labels';
import { MANUAL_PAYMENT_METHODS, type Invoice, type ManualPaymentMethod, type RecordPaymentInput } from '../types';
import type { InvoiceAction } from './invoice-action';

interface PaymentValues {
  method: ManualPaymentMethod;
  amount: string;
  reference: string;
  sendReceipt: boolean;
}

const REFERENCE_LABELS: Record<ManualPaymentMethod, string | null> = {
  cash: null,
  cheque: 'Cheque number',
  'card-terminal': 'Terminal reference',
};

interface PaymentModalProps {
  invoice: Invoice;
  opened: boolean;
  onClose: () => void;
  run: InvoiceAction;
}

/** Cash, a cheque or the card terminal against the invoice; a part payment leaves the rest owed. */
export function PaymentModal({ invoice, opened, onClose, run }: PaymentModalProps) {
  const { currency, balanceCents } = invoice;
  const [saving, setSaving] = useState(false);
  const form = useForm<PaymentValues>({
    initialValues: {
      method: 'cash',
      amount: centsToField(balanceCents, currency),
      reference: '',
      sendReceipt: invoice.billToEmail !== null,
    },
    validate: {
      amount: (value) => {
        const read = readAmount(
          value,
          currency,
          balanceCents,
          `That is more than is owed (${money(balanceCents, currency)}).`,
        );
        return 'error' in read ? read.error : null;
      },
      reference: (value, values) => {
        if (values.method === 'cash' || value.trim()) return null;
        return values.method === 'cheque' ? 'Write down the cheque number.' : 'Write down the terminal reference.';
      },
    },
  });

  const submit = form.onSubmit(async (values) => {
    const read = readAmount(values.amount, currency, balanceCents, '');
    if ('error' in read) return;
    const input: RecordPaymentInput = { method: values.method, amountCents: read.cents };
    if (values.method !== 'cash') input.reference = values.reference.trim();
    if (values.sendReceipt && invoice.billToEmail) input.sendReceipt = true;
    setSaving(true);
    const ok = await run({ kind: 'payment', input }, `${money(read.cents, currency)} recorded`);
    setSaving(false);
    if (ok) onClose();
  });

  const referenceLabel = REFERENCE_LABELS[form.values.method];
  return (
    <Modal opened={opened} onClose={onClose} title="Record a payment" centered>
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text>
            Owed now:{' '}
            <Text span fw={700}>
              {money(balanceCents, currency)}
            </Text>
          </Text>
          <SegmentedControl
            aria-label="How they paid"
            fullWidth
            orientation="vertical"
            data={MANUAL_PAYMENT_METHODS.map((value) => ({ value, label: PAYMENT_METHOD_LABELS[value] }))}
            {...form.getInputProps('method')}
          />
          <TextInput
            label="Amount"
            description="A part payment is fine; the rest stays owed."
            inputMode="decimal"
            required
            {...form.getInputProps('amount')}
          />
          {referenceLabel ? (
            <TextInput label={referenceLabel} autoComplete="off" required {...form.getInputProps('reference')} />
          ) : null}
          <Checkbox
            label={invoice.billToEmail ? `E-mail a receipt to ${invoice.billToEmail}` : 'E-mail a receipt'}
            description={invoice.billToEmail ? undefined : 'There is no e-mail address on this invoice.'}
            disabled={!invoice.billToEmail}
            {...form.getInputProps('sendReceipt', { type: 'checkbox' })}
          />
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" loading={saving}>
              Record payment
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
