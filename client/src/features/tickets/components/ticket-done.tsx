import { Button, Card, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import { IconCircleCheck } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { dueCents, money, SETTLEMENT_LABELS } from '../labels';
import type { Ticket } from '../types';

/** The ticket is handed back and paid or left for an invoice: nothing more to do at the bench. */
export function isTicketDone(ticket: Ticket): boolean {
  return ticket.status === 'handed-back' && (ticket.settlement !== 'unpaid' || dueCents(ticket) === 0);
}

export function TicketDone({ ticket, currency }: { ticket: Ticket; currency: string }) {
  const due = dueCents(ticket);
  return (
    <Card withBorder radius="lg" padding="lg" bg="var(--mantine-color-keenTeal-0)" role="region" aria-label="Done">
      <Stack gap="sm" align="flex-start">
        <ThemeIcon size={48} radius="xl" color="keenTeal">
          <IconCircleCheck size={30} aria-hidden="true" />
        </ThemeIcon>
        <Title order={2} fz="h2">
          Done
        </Title>
        <Text size="lg">
          {ticket.customer.name}’s shears are handed back. {SETTLEMENT_LABELS[ticket.settlement]}
          {ticket.settlement === 'to-invoice' && due > 0 ? `: ${money(due, currency)} to invoice` : ''}.
        </Text>
        {ticket.routeDayId && ticket.stop ? (
          <Button component={Link} to={paths.routeDays.stopVisit.getHref(ticket.routeDayId, ticket.stop.id)} size="lg">
            Back to {ticket.stop.name}
          </Button>
        ) : null}
        {ticket.routeDayId ? (
          <Button component={Link} to={paths.routeDays.sheet.getHref(ticket.routeDayId)} variant="default" size="lg">
            The day sheet
          </Button>
        ) : (
          <Button component={Link} to={paths.tickets.list.getHref()} variant="default" size="lg">
            All tickets
          </Button>
        )}
      </Stack>
    </Card>
  );
}
