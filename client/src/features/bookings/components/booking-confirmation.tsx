import { Alert, Button, Card, List, Stack, Text, Title } from '@mantine/core';
import { formatMoney } from '@keenroute/shared';
import { IconCircleCheck, IconMailCheck } from '@tabler/icons-react';
import { describeItem, formatBookingDay, formatMinutes, formatWindow } from '../format';
import type { PublicBooking } from '../types';

export function BookingWhen({ booking }: { booking: PublicBooking }) {
  if (booking.mailIn || !booking.day) return <Text fw={700}>Mail-in</Text>;
  return (
    <Text fw={700}>
      {formatBookingDay(booking.day)}
      {booking.arrivalWindow ? `, sharpener expected ${formatWindow(booking.arrivalWindow)}` : ''}
    </Text>
  );
}

/** What was booked: stop, day and window, the shears, and the estimate. */
export function BookingFacts({ booking }: { booking: PublicBooking }) {
  return (
    <Stack gap="xs">
      <div>
        <Text size="sm" c="dimmed">
          Stop
        </Text>
        <Text fw={700}>
          {booking.stop.name}
          {booking.stop.city ? `, ${booking.stop.city}` : ''}
        </Text>
      </div>
      <div>
        <Text size="sm" c="dimmed">
          When
        </Text>
        <BookingWhen booking={booking} />
      </div>
      <div>
        <Text size="sm" c="dimmed">
          Shears
        </Text>
        <List spacing={2}>
          {booking.items.map((item, index) => (
            <List.Item key={`${item.toolKind}-${item.edgeType}-${index}`}>{describeItem(item)}</List.Item>
          ))}
        </List>
      </div>
      <div>
        <Text size="sm" c="dimmed">
          Estimate
        </Text>
        <Text fw={700}>
          {formatMoney(booking.estimateCents)}{' '}
          <Text span size="sm" c="dimmed" fw={400}>
            (an estimate; about {formatMinutes(booking.benchMinutes)} of bench time)
          </Text>
        </Text>
      </div>
      {booking.notes ? (
        <div>
          <Text size="sm" c="dimmed">
            Notes
          </Text>
          <Text style={{ whiteSpace: 'pre-line' }}>{booking.notes}</Text>
        </div>
      ) : null}
    </Stack>
  );
}

export function BookingConfirmation({ booking, onAnother }: { booking: PublicBooking; onAnother: () => void }) {
  return (
    <Card withBorder radius="lg" padding="lg" role="status" aria-label="Drop-off booked">
      <Stack gap="md">
        <Title order={2} fz="h3" c="keenTeal.7">
          <IconCircleCheck size={26} aria-hidden="true" style={{ verticalAlign: 'text-bottom' }} /> Your drop-off is
          booked
        </Title>
        <BookingFacts booking={booking} />
        <Alert color="keenTeal" icon={<IconMailCheck size={20} />}>
          We sent a confirmation e-mail to {booking.email} with a link to change or cancel.
        </Alert>
        <Button variant="light" onClick={onAnother} mih={44}>
          Book another drop-off
        </Button>
      </Stack>
    </Card>
  );
}
