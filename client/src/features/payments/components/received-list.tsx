import { Group, Stack, Text, Title } from '@mantine/core';
import { formatDate } from '@/lib/format';
import { PAYMENT_METHOD_LABELS, REFUND_METHOD_LABELS, money } from '../format';
import type { InvoiceDetail } from '../types';

function Entry({ what, detail, amount }: { what: string; detail: string; amount: string }) {
  return (
    <Group component="li" justify="space-between" align="flex-start" gap="sm" wrap="nowrap">
      <div style={{ minWidth: 0 }}>
        <Text fw={600}>{what}</Text>
        <Text size="sm" c="dimmed">
          {detail}
        </Text>
      </div>
      <Text fw={600} style={{ whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' }}>
        {amount}
      </Text>
    </Group>
  );
}

/** The receipts of an invoice: each payment received (online, at the stop, by cheque) and each credit or refund. */
export function ReceivedList({ invoice }: { invoice: InvoiceDetail }) {
  const { currency } = invoice;
  return (
    <Stack gap="sm" component="section" aria-labelledby="my-invoice-payments">
      <Title order={3} fz="h5" id="my-invoice-payments">
        Payments received
      </Title>
      {invoice.payments.length === 0 ? (
        <Text size="sm" c="dimmed">
          No payments yet.
        </Text>
      ) : (
        <Stack component="ul" gap="sm" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Payments received">
          {invoice.payments.map((payment) => (
            <Entry
              key={payment.id}
              what={PAYMENT_METHOD_LABELS[payment.method]}
              detail={[
                formatDate(payment.recordedAt),
                payment.onSite ? 'taken at the stop' : null,
                payment.reference && payment.method !== 'online' ? `ref. ${payment.reference}` : null,
              ]
                .filter(Boolean)
                .join(' · ')}
              amount={money(payment.amountCents, currency)}
            />
          ))}
        </Stack>
      )}
      {invoice.creditNotes.length > 0 ? (
        <Stack component="ul" gap="sm" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Credits and refunds">
          {invoice.creditNotes.map((note) => (
            <Entry
              key={note.id}
              what={`Credit note ${note.number}`}
              detail={`${formatDate(note.createdAt)} · ${REFUND_METHOD_LABELS[note.refundMethod]} · ${note.reason}`}
              amount={money(note.amountCents, currency)}
            />
          ))}
        </Stack>
      ) : null}
    </Stack>
  );
}
