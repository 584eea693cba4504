import { Button, Card, Group, Stack, Text, Title } from '@mantine/core';
import { IconListDetails } from '@tabler/icons-react';
import { formatDay } from '@/lib/format';
import { useMyInvoice } from '../api/get-my-invoice';
import { isOwed, money } from '../format';
import type { InvoiceSummary } from '../types';
import { OpenPdfButton, PayOnlineLink } from './invoice-actions';
import { InvoiceStatusBadge } from './invoice-status-badge';
import { MoneyRows } from './money-rows';

// The list has no pay link; only an invoice with something owed fetches its detail for one (a client has few).
function PayFromCard({ invoice }: { invoice: InvoiceSummary }) {
  const detail = useMyInvoice(invoice.id);
  if (detail.isPending) {
    return (
      <Button size="lg" fullWidth loading disabled>
        Pay online
      </Button>
    );
  }
  if (!detail.data?.payUrl) return null;
  return (
    <PayOnlineLink payUrl={detail.data.payUrl} balanceCents={detail.data.balanceCents} currency={invoice.currency} />
  );
}

function datesOf(invoice: InvoiceSummary): string {
  const parts: string[] = [];
  if (invoice.issueDate) parts.push(`Issued ${formatDay(invoice.issueDate)}`);
  if (invoice.dueDate) parts.push(`due ${formatDay(invoice.dueDate)}`);
  return parts.join(', ');
}

export function MyInvoiceCard({ invoice, onOpen }: { invoice: InvoiceSummary; onOpen: () => void }) {
  const title = invoice.number ?? 'Invoice';
  const titleId = `my-invoice-${invoice.id}`;
  return (
    <Card withBorder radius="lg" padding="lg" component="article" aria-labelledby={titleId} h="100%">
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" gap="xs">
          <Title order={2} fz="h4" id={titleId}>
            {title}
          </Title>
          <InvoiceStatusBadge status={invoice.status} overdue={invoice.overdue} daysOverdue={invoice.daysOverdue} />
        </Group>
        <div>
          <Text size="sm">
            {invoice.billTo === 'stop'
              ? `Billed to ${invoice.billToName} (your shop)`
              : `Billed to ${invoice.billToName}`}
          </Text>
          <Text size="sm" c="dimmed">
            {datesOf(invoice)}
          </Text>
        </div>
        <MoneyRows
          rows={[
            { label: 'Total', value: money(invoice.totalCents, invoice.currency) },
            {
              label: 'Balance due',
              value: money(invoice.status === 'void' ? 0 : invoice.balanceCents, invoice.currency),
              strong: true,
            },
          ]}
        />
        {isOwed(invoice) ? <PayFromCard invoice={invoice} /> : null}
        <Group grow gap="sm">
          <Button
            variant="light"
            size="md"
            mih={48}
            leftSection={<IconListDetails size={20} aria-hidden="true" />}
            onClick={onOpen}
            aria-label={`Details and payments of ${title}`}
          >
            Details
          </Button>
          <OpenPdfButton id={invoice.id} number={invoice.number} />
        </Group>
      </Stack>
    </Card>
  );
}
