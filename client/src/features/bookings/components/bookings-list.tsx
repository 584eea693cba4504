import { Anchor, Badge, Card, Group, Stack, Table, Text } from '@mantine/core';
import type { Role } from '@keenroute/shared';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { STATUS_COLORS, STATUS_LABELS, formatBookingDay, summarizeItems } from '../format';
import type { StaffBooking } from '../types';

function DayCell({ booking, role }: { booking: StaffBooking; role: Role }) {
  if (booking.mailIn || !booking.day) return <Text size="sm">Mail-in</Text>;
  const label = formatBookingDay(booking.day);
  // The day sheet is for staff; each role reaches the route days the server lets them see.
  return booking.routeDayId && role !== 'client' ? (
    <Anchor component={Link} to={paths.routeDays.sheet.getHref(booking.routeDayId)} size="sm" fw={600}>
      {label}
    </Anchor>
  ) : (
    <Text size="sm">{label}</Text>
  );
}

function StatusBadge({ booking }: { booking: StaffBooking }) {
  return (
    <Badge color={STATUS_COLORS[booking.status]} variant="light">
      {STATUS_LABELS[booking.status]}
    </Badge>
  );
}

export function BookingsTable({ bookings, role }: { bookings: StaffBooking[]; role: Role }) {
  return (
    <Table.ScrollContainer minWidth={760}>
      <Table verticalSpacing="sm" striped="even" stripedColor="gray.0" highlightOnHover>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Day</Table.Th>
            <Table.Th>Stop</Table.Th>
            <Table.Th>Name</Table.Th>
            <Table.Th>Shears</Table.Th>
            <Table.Th ta="right">Bench minutes</Table.Th>
            <Table.Th>Status</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {bookings.map((booking) => (
            <Table.Tr key={booking.id}>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>
                <DayCell booking={booking} role={role} />
              </Table.Td>
              <Table.Td>{booking.stop.name}</Table.Td>
              <Table.Td>
                <Text size="sm" fw={600}>
                  {booking.name}
                </Text>
                <Anchor href={`tel:${booking.phone.replace(/[^\d+]/g, '')}`} size="xs">
                  {booking.phone}
                </Anchor>
              </Table.Td>
              <Table.Td>
                <Text size="sm">{summarizeItems(booking.items)}</Text>
              </Table.Td>
              <Table.Td ta="right">{booking.benchMinutes}</Table.Td>
              <Table.Td>
                <StatusBadge booking={booking} />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

/** One card per drop-off, for a phone held in one hand. */
export function BookingCards({ bookings, role }: { bookings: StaffBooking[]; role: Role }) {
  return (
    <Stack gap="sm" role="list" aria-label="Drop-offs">
      {bookings.map((booking) => (
        <Card key={booking.id} withBorder radius="md" padding="md" role="listitem">
          <Group justify="space-between" gap="xs" wrap="nowrap" align="flex-start">
            <div>
              <Text fw={700}>{booking.name}</Text>
              <Text size="sm" c="dimmed">
                {booking.stop.name}
              </Text>
            </div>
            <StatusBadge booking={booking} />
          </Group>
          <Group gap="xs" mt={4}>
            <DayCell booking={booking} role={role} />
            <Text size="sm" c="dimmed">
              · {booking.benchMinutes} bench min
            </Text>
          </Group>
          <Text size="sm" mt={4}>
            {summarizeItems(booking.items)}
          </Text>
          <Anchor
            href={`tel:${booking.phone.replace(/[^\d+]/g, '')}`}
            display="inline-flex"
            mih={44}
            style={{ alignItems: 'center' }}
            fw={600}
          >
            {booking.phone}
          </Anchor>
        </Card>
      ))}
    </Stack>
  );
}
