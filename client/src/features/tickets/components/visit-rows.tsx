import { Badge, Button, Card, Group, Stack, Text } from '@mantine/core';
import { IconArrowRight } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { SheetCustomer } from '@/features/route-days/types';
import { expectedWords, TICKET_KIND_LABELS, TICKET_STATUS_COLORS, TICKET_STATUS_LABELS } from '../labels';
import type { SheetBooking, TicketSummary } from '../types';

function TicketLink({ ticket, name }: { ticket: TicketSummary; name: string }) {
  return (
    <Stack gap="xs">
      <Badge size="lg" radius="sm" w="fit-content" color={TICKET_STATUS_COLORS[ticket.status]}>
        Ticket {TICKET_STATUS_LABELS[ticket.status].toLowerCase()}
      </Badge>
      <Button
        component={Link}
        to={paths.tickets.detail.getHref(ticket.id)}
        size="lg"
        variant="light"
        fullWidth
        rightSection={<IconArrowRight size={20} aria-hidden="true" />}
        aria-label={`Go to ${name}’s ticket`}
      >
        Go to ticket
      </Button>
    </Stack>
  );
}

interface CustomerRowProps {
  customer: SheetCustomer;
  ticket: TicketSummary | undefined;
  busy: boolean;
  onOpen: () => void;
}

/** A customer of the stop, and the one button that starts or continues their ticket. */
export function CustomerRow({ customer, ticket, busy, onOpen }: CustomerRowProps) {
  return (
    <Card component="li" withBorder radius="lg" padding="md">
      <Stack gap="sm">
        <Stack gap={2}>
          <Text fw={700} size="xl">
            {customer.name}
          </Text>
          <Text c="dimmed">
            {customer.shearCount} {customer.shearCount === 1 ? 'shear' : 'shears'} registered
          </Text>
        </Stack>
        {ticket ? (
          <TicketLink ticket={ticket} name={customer.name} />
        ) : (
          <Button size="lg" loading={busy} onClick={onOpen} aria-label={`Open a ticket for ${customer.name}`}>
            Open ticket
          </Button>
        )}
      </Stack>
    </Card>
  );
}

/** A drop-off booked online for this stop's day; checking it in makes its ticket. */
export function BookingRow({
  booking,
  busy,
  onCheckIn,
}: {
  booking: SheetBooking;
  busy: boolean;
  onCheckIn: () => void;
}) {
  return (
    <Card component="li" withBorder radius="lg" padding="md">
      <Stack gap="sm">
        <Stack gap={2}>
          <Group gap="xs">
            <Text fw={700} size="xl">
              {booking.name}
            </Text>
            <Badge variant="light" color="brass" radius="sm">
              Drop-off
            </Badge>
          </Group>
          <Text fw={600} c="brass.8">
            Booked: {expectedWords(booking.items)}
          </Text>
          {booking.phone ? <Text>{booking.phone}</Text> : null}
          {booking.notes ? <Text c="dimmed">{booking.notes}</Text> : null}
        </Stack>
        {booking.status === 'booked' ? (
          <Button size="lg" loading={busy} onClick={onCheckIn} aria-label={`Check in ${booking.name}`}>
            Check in
          </Button>
        ) : (
          <Text c="dimmed">Checked in: the ticket is on this page.</Text>
        )}
      </Stack>
    </Card>
  );
}

/** A ticket at this stop for someone not on its customer list: a checked-in drop-off or a new walk-up. */
export function OtherTicketRow({ ticket }: { ticket: TicketSummary }) {
  return (
    <Card component="li" withBorder radius="lg" padding="md">
      <Stack gap="sm">
        <Group gap="xs">
          <Text fw={700} size="xl">
            {ticket.customer.name}
          </Text>
          <Badge variant="light" color="gray" radius="sm">
            {TICKET_KIND_LABELS[ticket.kind]}
          </Badge>
        </Group>
        <TicketLink ticket={ticket} name={ticket.customer.name} />
      </Stack>
    </Card>
  );
}
