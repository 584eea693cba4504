import { Alert, Anchor, Button, Card, Group, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { IconCircleCheck, IconCircleOff, IconFileTypePdf, IconInfoCircle } from '@tabler/icons-react';
import { formatDay } from '@/lib/format';
import { discountFrom, isOwed, money } from '../format';
import type { PublicInvoice } from '../types';
import { InvoiceStatusBadge } from './invoice-status-badge';
import { MoneyRows, type MoneyRow } from './money-rows';
import { PayOnline } from './pay-online';

function Fact({ label, value, alert = false }: { label: string; value: string; alert?: boolean }) {
  return (
    <div>
      <Text size="sm" c="dimmed">
        {label}
      </Text>
      <Text fw={700} c={alert ? 'red.8' : undefined}>
        {value}
      </Text>
    </div>
  );
}

function Standing({ token, invoice }: { token: string; invoice: PublicInvoice }) {
  const { business } = invoice;
  if (invoice.status === 'void') {
    return (
      <Alert color="gray" icon={<IconCircleOff size={20} />} title="This invoice is void">
        {business.name} cancelled it, so nothing is owed on it. Questions about it go to {business.name}.
      </Alert>
    );
  }
  if (invoice.status === 'paid' || invoice.balanceCents <= 0) {
    return (
      <Alert color="green" icon={<IconCircleCheck size={20} />} title="Paid in full">
        Thank you: nothing is owed on this invoice.
      </Alert>
    );
  }
  if (isOwed(invoice) && invoice.canPayOnline) return <PayOnline token={token} invoice={invoice} />;
  return (
    <Alert color="brass" icon={<IconInfoCircle size={20} />} title="Online payment is not open for this invoice">
      To pay {money(invoice.balanceCents, invoice.currency)}, contact {business.name} below, or pay the sharpener at the
      next visit.
    </Alert>
  );
}

function moneyRows(invoice: PublicInvoice): MoneyRow[] {
  const currency = invoice.currency;
  const discount = discountFrom(invoice);
  const rows: MoneyRow[] = invoice.lines.map((line) => ({
    label: line.description,
    value: money(line.amountCents, currency),
  }));
  if (discount > 0) rows.push({ label: 'Discount', value: money(-discount, currency), ruleAbove: true });
  rows.push({ label: 'Tax', value: money(invoice.taxCents, currency), ruleAbove: discount === 0 });
  rows.push({ label: 'Total', value: money(invoice.totalCents, currency) });
  if (invoice.paidCents > 0) rows.push({ label: 'Paid', value: money(-invoice.paidCents, currency) });
  if (invoice.creditedCents > 0) rows.push({ label: 'Credited', value: money(-invoice.creditedCents, currency) });
  rows.push({ label: 'Balance due', value: money(invoice.balanceCents, currency), strong: true, ruleAbove: true });
  return rows;
}

/** The invoice behind a pay link: what is owed, the button to pay it, what it was for, and who to ask. */
export function PublicInvoiceView({ token, invoice }: { token: string; invoice: PublicInvoice }) {
  const { business } = invoice;
  const late = invoice.overdue && isOwed(invoice);
  return (
    <Stack gap="lg">
      <Group justify="space-between" align="flex-start" gap="sm">
        <div>
          <Text size="sm" c="dimmed">
            Balance due
          </Text>
          <Text fz={36} fw={800} lh={1.1} style={{ fontVariantNumeric: 'tabular-nums' }}>
            {money(invoice.status === 'void' ? 0 : invoice.balanceCents, invoice.currency)}
          </Text>
        </div>
        <InvoiceStatusBadge status={invoice.status} overdue={invoice.overdue} />
      </Group>

      <SimpleGrid cols={{ base: 2, sm: 3 }} spacing="sm">
        <Fact label="Billed to" value={invoice.billToName} />
        <Fact label="Issued" value={formatDay(invoice.issueDate)} />
        {invoice.dueDate ? <Fact label="Due" value={formatDay(invoice.dueDate)} alert={late} /> : null}
      </SimpleGrid>

      <Standing token={token} invoice={invoice} />

      <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="pay-invoice-lines">
        <Stack gap="sm">
          <Title order={2} fz="h4" id="pay-invoice-lines">
            What it is for
          </Title>
          <MoneyRows rows={moneyRows(invoice)} />
        </Stack>
      </Card>

      <Button
        component="a"
        href={invoice.pdfUrl}
        target="_blank"
        rel="noopener"
        variant="light"
        size="lg"
        fullWidth
        leftSection={<IconFileTypePdf size={22} aria-hidden="true" />}
      >
        Download PDF
      </Button>

      <Stack gap={4} component="section" aria-label="Who sent it">
        <Text size="sm" c="dimmed">
          Questions about this invoice
        </Text>
        <Text fw={700}>{business.name}</Text>
        {business.email ? (
          <Anchor href={`mailto:${business.email}`} py={6}>
            {business.email}
          </Anchor>
        ) : null}
        {business.phone ? (
          <Anchor href={`tel:${business.phone.replace(/[^\d+]/g, '')}`} py={6}>
            {business.phone}
          </Anchor>
        ) : null}
      </Stack>
    </Stack>
  );
}
