import { Anchor, Badge, Group, Paper, Stack, Text } from '@mantine/core';
import { IconPhone } from '@tabler/icons-react';
import { STATUS_COLORS, STATUS_LABELS, formatMinutes, summarizeItems } from '../format';
import type { BookingItem, BookingStatus } from '../types';

/** A drop-off as the day sheet lists it under its stop. */
export interface SheetBooking {
  id: string;
  name: string;
  phone: string;
  email: string;
  notes: string | null;
  status: BookingStatus;
  items: BookingItem[];
  benchMinutes: number;
}

/** "tel:" links want the digits (and a leading +) only. */
function telHref(phone: string): string {
  return `tel:${phone.replace(/[^\d+]/g, '')}`;
}

/** The drop-offs booked for one stop of a day sheet: who, how to reach them, and which shears to expect. */
export function StopBookings({ bookings }: { bookings: readonly SheetBooking[] }) {
  if (bookings.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        No drop-offs booked for this stop.
      </Text>
    );
  }
  return (
    <Stack gap="xs" role="list" aria-label="Drop-offs booked">
      {bookings.map((booking) => (
        <Paper key={booking.id} withBorder radius="md" p="sm" role="listitem">
          <Group justify="space-between" gap="xs" wrap="nowrap" align="flex-start">
            <Text fw={700} td={booking.status === 'cancelled' ? 'line-through' : undefined}>
              {booking.name}
            </Text>
            <Badge color={STATUS_COLORS[booking.status]} variant="light">
              {STATUS_LABELS[booking.status]}
            </Badge>
          </Group>
          <Anchor
            href={telHref(booking.phone)}
            display="inline-flex"
            mih={44}
            style={{ alignItems: 'center', gap: 6 }}
            fw={600}
          >
            <IconPhone size={18} aria-hidden="true" />
            {booking.phone}
          </Anchor>
          <Text size="sm">
            {summarizeItems(booking.items)} · about {formatMinutes(booking.benchMinutes)}
          </Text>
          {booking.notes ? (
            <Text size="sm" c="dimmed" fs="italic" style={{ whiteSpace: 'pre-line' }}>
              {booking.notes}
            </Text>
          ) : null}
        </Paper>
      ))}
    </Stack>
  );
}
