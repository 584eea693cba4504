import { Alert, Anchor, Button, Group, Stack, Text, Title } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconArrowLeft, IconUserPlus } from '@tabler/icons-react';
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { ListLoadFailed, ListLoading } from '@/components/list-states';
import { paths } from '@/config/paths';
import { useSheet } from '@/features/route-days/api/get-sheet';
import { timeRange } from '@/features/route-days/format';
import { useTickets } from '../api/get-tickets';
import { useCheckIn, useOpenTicket } from '../api/open-ticket';
import { BookingRow, CustomerRow, OtherTicketRow } from '../components/visit-rows';
import { WalkUpModal } from '../components/walk-up-modal';
import type { Ticket, TicketSummary, VisitStop } from '../types';

const ACCESS = [
  { field: 'accessParking', label: 'Parking' },
  { field: 'accessDoor', label: 'Door' },
  { field: 'accessBestTime', label: 'Best time' },
] as const;

// The newest ticket is the one still being worked.
function latestFor(tickets: TicketSummary[], match: (ticket: TicketSummary) => boolean): TicketSummary | undefined {
  return tickets.filter(match).sort((a, b) => b.createdAt.localeCompare(a.createdAt))[0];
}

/** One stop of the day, on the phone: where and when, how to get in, and each customer's ticket. */
export function StopVisitRoute() {
  const { routeDayId = '', stopId = '' } = useParams();
  const navigate = useNavigate();
  const sheet = useSheet(routeDayId);
  const tickets = useTickets({ routeDayId, stopId });
  const open = useOpenTicket();
  const checkIn = useCheckIn();
  const [busyFor, setBusyFor] = useState<string | null>(null);
  const [walkUpOpened, walkUp] = useDisclosure(false);

  if (sheet.isPending) return <ListLoading label="Loading the stop" />;
  if (sheet.isError) {
    return (
      <ListLoadFailed
        title="The stop could not be loaded"
        message={sheet.error.message}
        onRetry={() => void sheet.refetch()}
      />
    );
  }
  const stops: VisitStop[] = sheet.data.stops;
  const stop = stops.find((candidate) => candidate.stopId === stopId);
  if (!stop) {
    return (
      <Alert color="gray" title="This stop is not on that route day">
        <Anchor component={Link} to={paths.routeDays.sheet.getHref(routeDayId)}>
          Back to the day sheet
        </Anchor>
      </Alert>
    );
  }

  const ticketItems = tickets.data?.items ?? [];
  const bookings = stop.bookings.filter((booking) => booking.status !== 'cancelled');
  const customerIds = new Set(stop.customers.map((customer) => customer.id));
  // Checked-in drop-offs and walk-ups of people not on the sheet's list yet.
  const otherTickets = ticketItems.filter((ticket) => !customerIds.has(ticket.customer.id));
  const goTo = (ticket: Ticket) => void navigate(paths.tickets.detail.getHref(ticket.id));
  const settle = { onSuccess: goTo, onSettled: () => setBusyFor(null) };
  const notes = ACCESS.filter(({ field }) => stop[field].trim() !== '');

  return (
    <Stack gap="md" maw={720}>
      <Anchor component={Link} to={paths.routeDays.sheet.getHref(routeDayId)} size="sm">
        <Group gap={4} wrap="nowrap" mih={44}>
          <IconArrowLeft size={18} aria-hidden="true" />
          The day sheet
        </Group>
      </Anchor>
      <Stack gap={4}>
        <Title order={1} fz={{ base: 'h2', sm: 'h1' }}>
          {stop.name}
        </Title>
        <Text size="xl" fw={600} c="keenTeal.7">
          Arrive {timeRange(stop.arrivalWindow.from, stop.arrivalWindow.to)}
        </Text>
        <Text size="lg">
          {stop.street}, {stop.city}
        </Text>
      </Stack>
      {notes.length > 0 ? (
        <Stack gap={2} component="dl" m={0} aria-label="Access notes">
          {notes.map(({ field, label }) => (
            <Group key={field} gap={6} wrap="nowrap" align="baseline">
              <Text component="dt" fw={600} miw={90} size="lg">
                {label}
              </Text>
              <Text component="dd" m={0} size="lg">
                {stop[field]}
              </Text>
            </Group>
          ))}
        </Stack>
      ) : null}
      {tickets.isError ? (
        <ListLoadFailed
          title="The stop’s tickets could not be loaded"
          message={tickets.error.message}
          onRetry={() => void tickets.refetch()}
        />
      ) : null}

      <Button size="lg" variant="light" leftSection={<IconUserPlus size={22} />} onClick={walkUp.open}>
        Walk-up
      </Button>

      <Title order={2} fz="h3">
        Customers
      </Title>
      {stop.customers.length === 0 ? <Text c="dimmed">No customers on the list for this stop yet.</Text> : null}
      <Stack component="ul" gap="sm" p={0} m={0} style={{ listStyle: 'none' }} aria-label={`Customers at ${stop.name}`}>
        {stop.customers.map((customer) => (
          <CustomerRow
            key={customer.id}
            customer={customer}
            ticket={latestFor(ticketItems, (ticket) => ticket.customer.id === customer.id)}
            busy={busyFor === customer.id}
            onOpen={() => {
              setBusyFor(customer.id);
              open.mutate({ customerId: customer.id, stopId, routeDayId, kind: 'visit' }, settle);
            }}
          />
        ))}
      </Stack>

      {bookings.length > 0 ? (
        <>
          <Title order={2} fz="h3">
            Drop-offs booked
          </Title>
          <Stack component="ul" gap="sm" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Drop-offs booked">
            {bookings.map((booking) => (
              <BookingRow
                key={booking.id}
                booking={booking}
                busy={busyFor === booking.id}
                onCheckIn={() => {
                  setBusyFor(booking.id);
                  checkIn.mutate(booking.id, settle);
                }}
              />
            ))}
          </Stack>
        </>
      ) : null}

      {otherTickets.length > 0 ? (
        <>
          <Title order={2} fz="h3">
            Other tickets here
          </Title>
          <Stack component="ul" gap="sm" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Other tickets here">
            {otherTickets.map((ticket) => (
              <OtherTicketRow key={ticket.id} ticket={ticket} />
            ))}
          </Stack>
        </>
      ) : null}

      <WalkUpModal
        opened={walkUpOpened}
        onClose={walkUp.close}
        routeDayId={routeDayId}
        stopId={stopId}
        stopName={stop.name}
        customers={stop.customers}
      />
    </Stack>
  );
}
