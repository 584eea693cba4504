import { Anchor, Badge, Card, Group, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { formatDateTime, formatDay } from '@/lib/format';
import { money, PAYMENT_METHOD_LABELS, REFUND_METHOD_LABELS } from '../labels';
import type { Invoice } from '../types';

function Row({ children, amount }: { children: React.ReactNode; amount: string }) {
  return (
    <Group component="li" justify="space-between" align="flex-start" gap="sm" wrap="nowrap">
      <Stack gap={0} style={{ minWidth: 0 }}>
        {children}
      </Stack>
      <Text fw={600} style={{ whiteSpace: 'nowrap' }}>
        {amount}
      </Text>
    </Group>
  );
}

const listStyle = { listStyle: 'none', padding: 0, margin: 0 } as const;

/** The money that came in against the invoice and the credit notes on it. */
export function InvoiceLedger({ invoice }: { invoice: Invoice }) {
  const { currency } = invoice;
  if (invoice.payments.length === 0 && invoice.creditNotes.length === 0) return null;
  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="invoice-ledger-title">
      <Stack gap="sm">
        <Title order={2} fz="h3" id="invoice-ledger-title">
          Payments and credit notes
        </Title>
        {invoice.payments.length > 0 ? (
          <Stack component="ul" gap="xs" style={listStyle} aria-label="Payments">
            {invoice.payments.map((payment) => (
              <Row key={payment.id} amount={money(payment.amountCents, currency)}>
                <Group gap={6}>
                  <Text fw={600}>{PAYMENT_METHOD_LABELS[payment.method]}</Text>
                  {payment.onSite ? (
                    <Badge size="sm" variant="light" color="brass" radius="sm">
                      At the stop
                    </Badge>
                  ) : null}
                </Group>
                <Text size="sm" c="dimmed" style={{ overflowWrap: 'anywhere' }}>
                  {[formatDateTime(payment.recordedAt), payment.reference].filter(Boolean).join(' · ')}
                </Text>
              </Row>
            ))}
          </Stack>
        ) : null}
        {invoice.creditNotes.length > 0 ? (
          <Stack component="ul" gap="xs" style={listStyle} aria-label="Credit notes">
            {invoice.creditNotes.map((note) => (
              <Row key={note.id} amount={`−${money(note.amountCents, currency)}`}>
                <Text fw={600}>Credit note {note.number}</Text>
                <Text size="sm" style={{ overflowWrap: 'anywhere' }}>
                  {note.reason}
                </Text>
                <Text size="sm" c="dimmed">
                  {formatDateTime(note.createdAt)} · {REFUND_METHOD_LABELS[note.refundMethod]}
                </Text>
              </Row>
            ))}
          </Stack>
        ) : null}
      </Stack>
    </Card>
  );
}

/** The tickets the invoice bills, each a link for the staff who can open tickets. */
export function InvoiceTickets({ invoice, linkTickets }: { invoice: Invoice; linkTickets: boolean }) {
  if (invoice.tickets.length === 0) return null;
  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="invoice-tickets-title">
      <Stack gap="sm">
        <Title order={2} fz="h3" id="invoice-tickets-title">
          Tickets
        </Title>
        <Stack component="ul" gap="xs" style={listStyle} aria-label="Tickets on this invoice">
          {invoice.tickets.map((ticket) => {
            const words = [formatDay(ticket.visitDay), ticket.stopName, ticket.customerName]
              .filter(Boolean)
              .join(' · ');
            return (
              <Row key={ticket.id} amount={money(ticket.totalCents, invoice.currency)}>
                {linkTickets ? (
                  <Anchor component={Link} to={paths.tickets.detail.getHref(ticket.id)}>
                    {words}
                  </Anchor>
                ) : (
                  <Text>{words}</Text>
                )}
              </Row>
            );
          })}
        </Stack>
      </Stack>
    </Card>
  );
}
