import { Stack, Table, Text } from '@mantine/core';
import { formatMoney, type TicketPrice } from '@keenroute/shared';

function Row({ label, cents, currency, strong }: { label: string; cents: number; currency: string; strong?: boolean }) {
  return (
    <Table.Tr>
      <Table.Td fw={strong ? 700 : undefined}>{label}</Table.Td>
      <Table.Td ta="right" fw={strong ? 700 : 500} style={{ whiteSpace: 'nowrap' }}>
        {formatMoney(cents, currency)}
      </Table.Td>
    </Table.Tr>
  );
}

/** The ticket as the shared rules price it: each line explained, then discount, minimum, trip, tax and total. */
export function QuotePreview({ price }: { price: TicketPrice }) {
  const currency = price.currency;
  const taxLine = price.summary.at(-1) ?? '';
  return (
    <Stack gap="sm" aria-label="Quote preview" component="section">
      <Stack component="ol" gap={4} p={0} m={0} style={{ listStyle: 'none' }} aria-label="Priced shears">
        {price.lines.map((line, index) => (
          <Text key={index} component="li" size="sm">
            {index + 1}. {line.explanation}
          </Text>
        ))}
      </Stack>
      <Table withRowBorders={false} verticalSpacing={4} aria-label="Ticket totals">
        <Table.Tbody>
          <Row
            label={`Shear lines (${price.pairCount} ${price.pairCount === 1 ? 'pair' : 'pairs'})`}
            cents={price.linesCents}
            currency={currency}
          />
          {price.discount ? (
            <Row label={`Discount: ${price.discount.explanation}`} cents={-price.discount.cents} currency={currency} />
          ) : null}
          {price.minimumTopUpCents > 0 ? (
            <Row label="Raised to the ticket minimum" cents={price.minimumTopUpCents} currency={currency} />
          ) : null}
          {price.tripChargeCents > 0 ? (
            <Row label="Trip charge for the stop visit" cents={price.tripChargeCents} currency={currency} />
          ) : null}
          <Row label="Subtotal" cents={price.subtotalCents} currency={currency} />
          <Row label={`Tax: ${taxLine}`} cents={price.taxCents} currency={currency} />
          <Row label="Total" cents={price.totalCents} currency={currency} strong />
        </Table.Tbody>
      </Table>
      <Text size="xs" c="dimmed">
        {price.taxNote}
      </Text>
    </Stack>
  );
}
