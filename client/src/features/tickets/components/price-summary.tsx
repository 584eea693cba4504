import { Card, Group, List, Stack, Text, Title } from '@mantine/core';
import { money } from '../labels';
import { useTicketScreen } from './ticket-context';

function Row({ label, cents, strong = false }: { label: string; cents: number; strong?: boolean }) {
  const { currency } = useTicketScreen();
  return (
    <Group justify="space-between" gap="sm" component="div">
      <Text component="dt" fw={strong ? 700 : 400} size={strong ? 'xl' : 'md'}>
        {label}
      </Text>
      <Text component="dd" m={0} fw={strong ? 700 : 500} size={strong ? 'xl' : 'md'}>
        {money(cents, currency)}
      </Text>
    </Group>
  );
}

/** The ticket's price as the server worked it out from the rates: subtotal, tax with its note, total. */
export function PriceSummary() {
  const { ticket, currency } = useTicketScreen();
  const { price } = ticket;
  const paid = ticket.payments.reduce((sum, payment) => sum + payment.amountCents, 0);
  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="ticket-price-title">
      <Stack gap="xs">
        <Title order={2} fz="h3" id="ticket-price-title">
          Price
        </Title>
        {price.summary.length > 0 ? (
          <List size="sm" spacing={2}>
            {price.summary.map((line) => (
              <List.Item key={line}>{line}</List.Item>
            ))}
          </List>
        ) : null}
        <Stack gap={4} component="dl" m={0}>
          <Row label="Subtotal" cents={price.subtotalCents} />
          <Row label="Tax" cents={price.taxCents} />
          <Row label="Total" cents={price.totalCents} strong />
          {paid > 0 ? <Row label="Paid" cents={paid} /> : null}
        </Stack>
        <Text size="xs" c="dimmed">
          {price.taxNote}
        </Text>
        {paid > 0 ? (
          <Text size="sm" aria-label="Payments">
            {ticket.payments.map((payment) => `${money(payment.amountCents, currency)}`).join(' + ')} recorded
          </Text>
        ) : null}
      </Stack>
    </Card>
  );
}
