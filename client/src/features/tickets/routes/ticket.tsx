import { Anchor, Box, Card, Group, Stack, Text } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { useMemo } from 'react';
import { Link, useParams } from 'react-router-dom';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { RecordLoadFailed } from '@/features/customers/components/record-states';
import { useSignedInUser } from '@/lib/session';
import { useTicket } from '../api/get-ticket';
import { AddShearPanel } from '../components/add-shear-panel';
import { PaymentForm } from '../components/payment-form';
import { PriceSummary } from '../components/price-summary';
import { SaveIndicator } from '../components/save-indicator';
import { TicketActions } from '../components/ticket-actions';
import { TicketScreenContext, type TicketScreen } from '../components/ticket-context';
import { isTicketDone, TicketDone } from '../components/ticket-done';
import { TicketHeader } from '../components/ticket-header';
import { TicketLineCard } from '../components/ticket-line-card';
import { useTicketSaver } from '../hooks/use-ticket-saver';
import { currencyOf } from '../labels';
import type { Ticket } from '../types';

function backLink(ticket: Ticket | undefined): { to: string; label: string } {
  if (ticket?.routeDayId && ticket.stop) {
    return { to: paths.routeDays.stopVisit.getHref(ticket.routeDayId, ticket.stop.id), label: ticket.stop.name };
  }
  return { to: paths.tickets.list.getHref(), label: 'Tickets' };
}

/** One customer's ticket on the phone: add shears, work them at the bench, hand back, take payment. */
export function TicketRoute() {
  const { ticketId = '' } = useParams();
  const { role } = useSignedInUser();
  const ticket = useTicket(ticketId);
  const saver = useTicketSaver(ticketId);
  const screen = useMemo<TicketScreen | null>(
    () =>
      ticket.data
        ? {
            ticket: ticket.data,
            saver,
            role,
            currency: currencyOf(ticket.data),
            editable: ticket.data.status === 'open',
          }
        : null,
    [ticket.data, saver, role],
  );

  if (ticket.isPending) return <PageLoader label="Loading the ticket" />;
  if (ticket.isError || !screen) {
    return (
      <RecordLoadFailed
        what="ticket"
        error={ticket.error ?? new Error('The ticket could not be loaded.')}
        onRetry={() => void ticket.refetch()}
        back={{ to: paths.tickets.list.getHref(), label: 'Back to the tickets' }}
      />
    );
  }

  const record = screen.ticket;
  const back = backLink(record);
  const done = isTicketDone(record);
  return (
    <TicketScreenContext.Provider value={screen}>
      <Stack gap="md" maw={720}>
        <Box
          pos="sticky"
          top={64}
          py={4}
          bg="var(--mantine-color-body)"
          style={{ zIndex: 5, borderBottom: '1px solid var(--mantine-color-gray-2)' }}
        >
          <Group justify="space-between" gap="xs" wrap="nowrap">
            <Anchor component={Link} to={back.to} size="sm" style={{ minWidth: 0 }}>
              <Group gap={4} wrap="nowrap" mih={44}>
                <IconArrowLeft size={18} aria-hidden="true" />
                <Text span size="sm" truncate>
                  {back.label}
                </Text>
              </Group>
            </Anchor>
            <SaveIndicator state={saver.state} onRetry={saver.retry} />
          </Group>
        </Box>
        <TicketHeader ticket={record} />
        {done ? <TicketDone ticket={record} currency={screen.currency} /> : null}
        {screen.editable ? <AddShearPanel /> : null}
        {record.lines.length > 0 ? (
          <Stack component="ol" gap="md" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Shears on this ticket">
            {record.lines.map((line) => (
              <TicketLineCard key={line.id} line={line} />
            ))}
          </Stack>
        ) : (
          <Card withBorder radius="lg" padding="lg">
            <Text ta="center">No shears on this ticket yet.</Text>
          </Card>
        )}
        <PriceSummary />
        <TicketActions />
        {record.status === 'handed-back' && !done ? <PaymentForm key={record.payments.length} /> : null}
      </Stack>
    </TicketScreenContext.Provider>
  );
}
