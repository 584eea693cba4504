import { Card, Group, Stack, Table, Text, Title } from '@mantine/core';
import { money, percent } from '../labels';
import type { Invoice } from '../types';

function TotalRow({
  label,
  cents,
  currency,
  strong = false,
}: {
  label: string;
  cents: number;
  currency: string;
  strong?: boolean;
}) {
  return (
    <Group justify="space-between" gap="sm" wrap="nowrap">
      <Text component="dt" fw={strong ? 700 : 400} size={strong ? 'lg' : 'sm'}>
        {label}
      </Text>
      <Text component="dd" m={0} fw={strong ? 700 : 500} size={strong ? 'lg' : 'sm'} style={{ whiteSpace: 'nowrap' }}>
        {money(cents, currency)}
      </Text>
    </Group>
  );
}

/** The lines as the server priced them, then discount, tax per rate, total, what came in and what is left. */
export function InvoiceLines({ invoice }: { invoice: Invoice }) {
  const { currency } = invoice;
  const discountLabel = invoice.discountBp > 0 ? `Discount (${percent(invoice.discountBp)})` : 'Discount';
  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="invoice-lines-title">
      <Stack gap="sm">
        <Title order={2} fz="h3" id="invoice-lines-title">
          Lines
        </Title>
        <Table.ScrollContainer minWidth={300}>
          <Table verticalSpacing="xs" aria-label="Invoice lines">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Description</Table.Th>
                <Table.Th>Tax</Table.Th>
                <Table.Th ta="right">Amount</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {invoice.lines.map((line) => (
                <Table.Tr key={line.id}>
                  <Table.Td style={{ overflowWrap: 'anywhere' }}>
                    {line.description}
                    {line.kind === 'adjustment' ? (
                      <Text span size="xs" c="dimmed" display="block">
                        From the ticket’s price
                      </Text>
                    ) : null}
                  </Table.Td>
                  <Table.Td style={{ whiteSpace: 'nowrap' }}>
                    {line.taxable ? (
                      percent(line.taxRateBp)
                    ) : (
                      <Text span size="sm" c="dimmed">
                        None
                      </Text>
                    )}
                  </Table.Td>
                  <Table.Td ta="right" style={{ whiteSpace: 'nowrap' }}>
                    {money(line.amountCents, currency)}
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
        <Stack gap={4} component="dl" m={0} maw={420} ml="auto" w="100%" aria-label="Totals">
          <TotalRow label="Lines" cents={invoice.linesCents} currency={currency} />
          {invoice.discountTotalCents > 0 ? (
            <TotalRow label={discountLabel} cents={-invoice.discountTotalCents} currency={currency} />
          ) : null}
          <TotalRow label="Subtotal" cents={invoice.subtotalCents} currency={currency} />
          {invoice.taxGroups.map((group) => (
            <TotalRow
              key={group.taxRateBp}
              label={`Tax ${percent(group.taxRateBp)} on ${money(group.taxableCents, currency)}`}
              cents={group.taxCents}
              currency={currency}
            />
          ))}
          {invoice.taxGroups.length === 0 ? (
            <TotalRow label="Tax" cents={invoice.taxCents} currency={currency} />
          ) : null}
          <TotalRow label="Total" cents={invoice.totalCents} currency={currency} strong />
          {invoice.paidCents > 0 ? <TotalRow label="Paid" cents={-invoice.paidCents} currency={currency} /> : null}
          {invoice.creditedCents > 0 ? (
            <TotalRow label="Credited" cents={-invoice.creditedCents} currency={currency} />
          ) : null}
          {invoice.status !== 'void' ? (
            <TotalRow label="Balance due" cents={invoice.balanceCents} currency={currency} strong />
          ) : null}
        </Stack>
      </Stack>
    </Card>
  );
}
