import { Alert, Card, Group, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { formatDateTime, formatDay } from '@/lib/format';
import { invoiceTitle, money } from '../labels';
import type { Invoice } from '../types';
import { InvoiceStatusBadge } from './invoice-status-badge';

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div>
      <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
        {label}
      </Text>
      <Text>{children}</Text>
    </div>
  );
}

/** The number, the status and how overdue, who it is to, and when it is due. */
export function InvoiceHeader({ invoice }: { invoice: Invoice }) {
  const owed = invoice.status !== 'void' && invoice.status !== 'draft';
  return (
    <Stack gap="sm">
      <Group justify="space-between" align="flex-end" gap="sm">
        <Stack gap={6}>
          <InvoiceStatusBadge invoice={invoice} size="lg" />
          <Title order={1} fz={{ base: 'h2', sm: 'h1' }}>
            {invoiceTitle(invoice)}
          </Title>
        </Stack>
        {owed ? (
          <Stack gap={0} align="flex-end">
            <Text size="sm" c="dimmed">
              Balance due
            </Text>
            <Text fz={28} fw={700} c={invoice.overdue ? 'red.8' : undefined} aria-label="Balance due">
              {money(invoice.balanceCents, invoice.currency)}
            </Text>
          </Stack>
        ) : null}
      </Group>
      {invoice.status === 'void' ? (
        <Alert color="gray" title="This invoice is void">
          {invoice.voidReason ?? 'No reason was given.'}
          {invoice.voidedAt ? ` (${formatDateTime(invoice.voidedAt)})` : ''}
        </Alert>
      ) : null}
      {invoice.status === 'draft' ? (
        <Alert color="brass" title="Draft">
          Nothing is owed yet: issuing gives it its number and due date. Sending by e-mail issues it too.
        </Alert>
      ) : null}
      <Card withBorder radius="lg" padding="md">
        <SimpleGrid cols={{ base: 1, xs: 2, md: 4 }} spacing="md">
          <div>
            <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
              Bill to {invoice.billTo === 'stop' ? '(the stop)' : '(the customer)'}
            </Text>
            <Text fw={600} style={{ overflowWrap: 'anywhere' }}>
              {invoice.billToName}
            </Text>
            {invoice.billToAddress ? (
              <Text size="sm" style={{ whiteSpace: 'pre-line' }}>
                {invoice.billToAddress}
              </Text>
            ) : null}
            <Text size="sm" c="dimmed" style={{ overflowWrap: 'anywhere' }}>
              {invoice.billToEmail ?? 'No e-mail on file'}
            </Text>
          </div>
          <Fact label="Issued">{invoice.issueDate ? formatDay(invoice.issueDate) : 'Not yet'}</Fact>
          <Fact label="Due">
            {invoice.dueDate ? formatDay(invoice.dueDate) : `${invoice.termsDays} days after issue`}
          </Fact>
          <Fact label="Sent by e-mail">{invoice.sentAt ? formatDateTime(invoice.sentAt) : 'Not yet'}</Fact>
        </SimpleGrid>
        {invoice.notes ? (
          <Text size="sm" mt="md" style={{ whiteSpace: 'pre-line' }}>
            {invoice.notes}
          </Text>
        ) : null}
      </Card>
    </Stack>
  );
}
