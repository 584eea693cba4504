import { Button, Card, SegmentedControl, Stack, Text, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { currencyDigits, isRuleError, parseMoney } from '@keenroute/shared';
import { useState } from 'react';
import { dueCents, money, PAYMENT_METHOD_LABELS } from '../labels';
import { PAYMENT_METHODS, type PaymentInput, type PaymentMethod } from '../types';
import { useTicketScreen } from './ticket-context';

interface PaymentValues {
  method: PaymentMethod;
  amount: string;
  reference: string;
}

/** Reads the amount field as cents, or says what is wrong with it. */
export function amountProblem(text: string, currency: string, due: number): string | null {
  let cents: number;
  try {
    cents = parseMoney(text, currency, 'The amount');
  } catch (error) {
    if (isRuleError(error)) return error.message;
    throw error;
  }
  if (cents <= 0) return 'The amount must be more than zero.';
  if (cents > due) return `That is more than is due (${money(due, currency)}).`;
  return null;
}

const REFERENCE_LABELS: Record<PaymentMethod, string | null> = {
  cash: null,
  cheque: 'Cheque number',
  'card-terminal': 'Terminal reference',
};

/** Records a payment taken on site (cash, cheque, card on the terminal), or leaves the ticket for an invoice. */
export function PaymentForm() {
  const { ticket, saver, currency } = useTicketScreen();
  const due = dueCents(ticket);
  const [saving, setSaving] = useState<'payment' | 'invoice' | null>(null);
  const form = useForm<PaymentValues>({
    initialValues: {
      method: 'cash',
      amount: (due / 10 ** currencyDigits(currency)).toFixed(currencyDigits(currency)),
      reference: '',
    },
    validate: {
      amount: (value) => amountProblem(value, currency, due),
      reference: (value, values) =>
        values.method === 'cheque' && !value.trim() ? 'Write down the cheque number.' : null,
    },
  });

  const submit = form.onSubmit(async (values) => {
    const input: PaymentInput = { method: values.method, amountCents: parseMoney(values.amount, currency) };
    if (values.method !== 'cash' && values.reference.trim()) input.reference = values.reference.trim();
    setSaving('payment');
    await saver.save({ kind: 'payment', input });
    setSaving(null);
  });

  const referenceLabel = REFERENCE_LABELS[form.values.method];
  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="payment-title">
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Title order={2} fz="h3" id="payment-title">
            Take payment
          </Title>
          <Text size="lg">
            Due now:{' '}
            <Text span fw={700}>
              {money(due, currency)}
            </Text>
          </Text>
          <SegmentedControl
            aria-label="How they pay"
            fullWidth
            orientation="vertical"
            size="md"
            data={PAYMENT_METHODS.map((value) => ({ value, label: PAYMENT_METHOD_LABELS[value] }))}
            styles={{ label: { minHeight: 44, display: 'flex', alignItems: 'center', justifyContent: 'center' } }}
            {...form.getInputProps('method')}
          />
          <TextInput
            label="Amount"
            description="A part payment is fine; the rest stays due."
            inputMode="decimal"
            size="lg"
            required
            {...form.getInputProps('amount')}
          />
          {referenceLabel ? (
            <TextInput
              label={referenceLabel}
              size="lg"
              autoComplete="off"
              required={form.values.method === 'cheque'}
              {...form.getInputProps('reference')}
            />
          ) : null}
          <Button type="submit" size="lg" loading={saving === 'payment'}>
            Record payment
          </Button>
          <Button
            variant="default"
            size="lg"
            loading={saving === 'invoice'}
            onClick={() => {
              setSaving('invoice');
              void saver.save({ kind: 'to-invoice' }).finally(() => setSaving(null));
            }}
          >
            Leave it for an invoice
          </Button>
        </Stack>
      </form>
    </Card>
  );
}
