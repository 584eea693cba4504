import { formatBasisPoints } from '@keenroute/shared';
import { Alert, Drawer, Stack, Text, Title } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { IconCircleOff } from '@tabler/icons-react';
import { ListLoadFailed } from '@/components/list-states';
import { PageLoader } from '@/components/page-loader';
import { formatDate, formatDay } from '@/lib/format';
import { useMyInvoice } from '../api/get-my-invoice';
import { money } from '../format';
import type { InvoiceDetail } from '../types';
import { OpenPdfButton, PayOnlineLink } from './invoice-actions';
import { InvoiceStatusBadge } from './invoice-status-badge';
import { MoneyRows, type MoneyRow } from './money-rows';
import { ReceivedList } from './received-list';

function amountRows(invoice: InvoiceDetail): MoneyRow[] {
  const currency = invoice.currency;
  const rows: MoneyRow[] = [...invoice.lines]
    .sort((a, b) => a.position - b.position)
    .map((line) => ({ label: line.description, value: money(line.amountCents, currency) }));
  if (invoice.discountTotalCents > 0) {
    const share = invoice.discountBp > 0 ? ` (${formatBasisPoints(invoice.discountBp)})` : '';
    rows.push({ label: `Discount${share}`, value: money(-invoice.discountTotalCents, currency), ruleAbove: true });
  }
  rows.push({ label: 'Subtotal', value: money(invoice.subtotalCents, currency), ruleAbove: true });
  for (const group of invoice.taxGroups) {
    rows.push({ label: `Tax ${formatBasisPoints(group.taxRateBp)}`, value: money(group.taxCents, currency) });
  }
  if (invoice.taxGroups.length === 0) rows.push({ label: 'Tax', value: money(invoice.taxCents, currency) });
  rows.push({ label: 'Total', value: money(invoice.totalCents, currency) });
  if (invoice.paidCents > 0) rows.push({ label: 'Paid', value: money(-invoice.paidCents, currency) });
  if (invoice.creditedCents > 0) rows.push({ label: 'Credited', value: money(-invoice.creditedCents, currency) });
  const balance = invoice.status === 'void' ? 0 : invoice.balanceCents;
  rows.push({ label: 'Balance due', value: money(balance, currency), strong: true, ruleAbove: true });
  return rows;
}

function InvoiceBody({ invoice }: { invoice: InvoiceDetail }) {
  return (
    <Stack gap="lg">
      <Stack gap={6}>
        <InvoiceStatusBadge status={invoice.status} overdue={invoice.overdue} daysOverdue={invoice.daysOverdue} />
        <Text size="sm">Billed to {invoice.billToName}</Text>
        <Text size="sm" c="dimmed">
          {invoice.issueDate ? `Issued ${formatDay(invoice.issueDate)}` : ''}
          {invoice.dueDate ? `, due ${formatDay(invoice.dueDate)}` : ''}
        </Text>
      </Stack>
      {invoice.status === 'void' ? (
        <Alert color="gray" icon={<IconCircleOff size={20} />} title="This invoice is void">
          {invoice.voidReason ? `Reason: ${invoice.voidReason}. ` : ''}
          {invoice.voidedAt ? `Voided ${formatDate(invoice.voidedAt)}; ` : ''}nothing is owed on it.
        </Alert>
      ) : null}
      {invoice.payUrl ? (
        <PayOnlineLink payUrl={invoice.payUrl} balanceCents={invoice.balanceCents} currency={invoice.currency} />
      ) : null}
      <Stack gap="sm" component="section" aria-labelledby="my-invoice-amounts">
        <Title order={3} fz="h5" id="my-invoice-amounts">
          What it is for
        </Title>
        <MoneyRows rows={amountRows(invoice)} />
      </Stack>
      <ReceivedList invoice={invoice} />
      {invoice.notes ? (
        <Stack gap={4}>
          <Title order={3} fz="h5">
            Notes
          </Title>
          <Text size="sm" style={{ whiteSpace: 'pre-line' }}>
            {invoice.notes}
          </Text>
        </Stack>
      ) : null}
      <OpenPdfButton id={invoice.id} number={invoice.number} fullWidth />
    </Stack>
  );
}

function DrawerContent({ id }: { id: string }) {
  const invoice = useMyInvoice(id);
  if (invoice.isPending) return <PageLoader label="Loading the invoice" />;
  if (invoice.isError) {
    return (
      <ListLoadFailed
        title="The invoice could not be loaded"
        message={invoice.error.message}
        onRetry={() => void invoice.refetch()}
      />
    );
  }
  return <InvoiceBody invoice={invoice.data} />;
}

/** One of my invoices in full: lines, tax, payments received (the receipts) and refunds, with PDF and pay link. */
export function InvoiceDrawer({ id, title, onClose }: { id: string | null; title: string; onClose: () => void }) {
  // On a phone the drawer takes the whole screen; the browser's back button closes it (the id is in the address).
  const phone = useMediaQuery('(max-width: 36em)');
  return (
    <Drawer
      opened={id !== null}
      onClose={onClose}
      position="right"
      size={phone ? '100%' : 'md'}
      title={
        <Text fw={700} fz="lg">
          {title}
        </Text>
      }
      closeButtonProps={{ 'aria-label': 'Close the invoice', size: 'xl' }}
    >
      {id ? <DrawerContent id={id} /> : null}
    </Drawer>
  );
}
