import { Badge, Group } from '@mantine/core';
import { INVOICE_STATUS_COLORS, INVOICE_STATUS_LABELS, overdueWords } from '../labels';
import type { InvoiceSummary } from '../types';

/** The status, and beside it how long it is overdue (derived on the server, never stored). */
export function InvoiceStatusBadge({
  invoice,
  size = 'md',
}: {
  invoice: Pick<InvoiceSummary, 'status' | 'overdue' | 'daysOverdue'>;
  size?: 'md' | 'lg';
}) {
  return (
    <Group gap={6} wrap="wrap">
      <Badge size={size} radius="sm" color={INVOICE_STATUS_COLORS[invoice.status]}>
        {INVOICE_STATUS_LABELS[invoice.status]}
      </Badge>
      {invoice.overdue ? (
        <Badge size={size} radius="sm" color="red" variant="light">
          {overdueWords(invoice.daysOverdue)}
        </Badge>
      ) : null}
    </Group>
  );
}
