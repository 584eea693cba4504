import { Anchor, Group, Stack, Table, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { formatDay } from '@/lib/format';
import { money } from '../labels';
import type { InvoiceSummary } from '../types';
import { InvoiceStatusBadge } from './invoice-status-badge';

const dash = (
  <Text span c="dimmed">
    —
  </Text>
);

function NumberLink({ invoice }: { invoice: InvoiceSummary }) {
  return (
    <Anchor component={Link} to={paths.invoices.detail.getHref(invoice.id)} fw={600} style={{ whiteSpace: 'nowrap' }}>
      {invoice.number ?? 'Draft'}
    </Anchor>
  );
}

/** The desk's view: what identifies the invoice and what is owed first, the dates after. */
export function InvoiceTable({ invoices }: { invoices: InvoiceSummary[] }) {
  return (
    <Table.ScrollContainer minWidth={860}>
      <Table verticalSpacing="sm" highlightOnHover striped="even" stripedColor="gray.0" aria-label="Invoices">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Number</Table.Th>
            <Table.Th>Bill to</Table.Th>
            <Table.Th>Status</Table.Th>
            <Table.Th ta="right">Balance</Table.Th>
            <Table.Th ta="right">Total</Table.Th>
            <Table.Th>Issued</Table.Th>
            <Table.Th>Due</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {invoices.map((invoice) => (
            <Table.Tr key={invoice.id}>
              <Table.Td>
                <NumberLink invoice={invoice} />
              </Table.Td>
              <Table.Td miw={180}>
                {invoice.billToName}
                <Text span size="xs" c="dimmed" ml={6}>
                  {invoice.billTo === 'stop' ? 'stop' : 'customer'}
                </Text>
              </Table.Td>
              <Table.Td>
                <InvoiceStatusBadge invoice={invoice} />
              </Table.Td>
              <Table.Td ta="right" fw={600} style={{ whiteSpace: 'nowrap' }}>
                {invoice.status === 'void' ? dash : money(invoice.balanceCents, invoice.currency)}
              </Table.Td>
              <Table.Td ta="right" style={{ whiteSpace: 'nowrap' }}>
                {money(invoice.totalCents, invoice.currency)}
              </Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>
                {invoice.issueDate ? formatDay(invoice.issueDate) : dash}
              </Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>
                {invoice.dueDate ? formatDay(invoice.dueDate) : dash}
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

/** The phone's view: one card per invoice, the whole card a link, the balance large. */
export function InvoiceCards({ invoices }: { invoices: InvoiceSummary[] }) {
  return (
    <ul
      aria-label="Invoices"
      style={{ listStyle: 'none', padding: 0, margin: 0, display: 'grid', gap: 'var(--mantine-spacing-sm)' }}
    >
      {invoices.map((invoice) => (
        <li key={invoice.id}>
          <Anchor
            component={Link}
            to={paths.invoices.detail.getHref(invoice.id)}
            underline="never"
            c="inherit"
            display="block"
            p="md"
            style={{ border: '1px solid var(--mantine-color-gray-3)', borderRadius: 'var(--mantine-radius-md)' }}
          >
            <Group justify="space-between" align="flex-start" gap="sm" wrap="nowrap">
              <Stack gap={2} style={{ minWidth: 0 }}>
                <Text fw={700}>{invoice.number ?? 'Draft'}</Text>
                <Text size="sm" style={{ overflowWrap: 'anywhere' }}>
                  {invoice.billToName}
                </Text>
                <Text size="sm" c="dimmed">
                  {invoice.dueDate ? `Due ${formatDay(invoice.dueDate)}` : 'Not issued yet'}
                </Text>
              </Stack>
              <Stack gap={4} align="flex-end">
                <Text fw={700} size="lg" style={{ whiteSpace: 'nowrap' }}>
                  {money(invoice.status === 'void' ? 0 : invoice.balanceCents, invoice.currency)}
                </Text>
                <Text size="xs" c="dimmed" style={{ whiteSpace: 'nowrap' }}>
                  of {money(invoice.totalCents, invoice.currency)}
                </Text>
              </Stack>
            </Group>
            <Group mt={6}>
              <InvoiceStatusBadge invoice={invoice} />
            </Group>
          </Anchor>
        </li>
      ))}
    </ul>
  );
}
