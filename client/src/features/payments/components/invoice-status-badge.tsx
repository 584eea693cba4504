import { Badge, Group } from '@mantine/core';
import { STATUS_COLORS, STATUS_LABELS } from '../format';
import type { InvoiceStatus } from '../types';

interface InvoiceStatusBadgeProps {
  status: InvoiceStatus;
  overdue: boolean;
  daysOverdue?: number;
}

export function InvoiceStatusBadge({ status, overdue, daysOverdue }: InvoiceStatusBadgeProps) {
  const late = overdue && (status === 'sent' || status === 'part-paid');
  return (
    <Group gap={6} wrap="nowrap">
      <Badge color={STATUS_COLORS[status]} variant="light" size="lg">
        {STATUS_LABELS[status]}
      </Badge>
      {late ? (
        <Badge color="red" variant="filled" size="lg">
          {daysOverdue && daysOverdue > 0 ? `Overdue ${daysOverdue} ${daysOverdue === 1 ? 'day' : 'days'}` : 'Overdue'}
        </Badge>
      ) : null}
    </Group>
  );
}
