import { Alert, Badge, Group, Stack, Text } from '@mantine/core';
import { IconClockOff, IconInfoCircle } from '@tabler/icons-react';
import { useParams } from 'react-router-dom';
import { ListLoadFailed } from '@/components/list-states';
import { PageLoader } from '@/components/page-loader';
import { ApiError } from '@/lib/api-error';
import { useManagedBooking } from '../api/get-managed-booking';
import { BookingFacts } from '../components/booking-confirmation';
import { CancelBooking } from '../components/cancel-booking';
import { BookingLinkNotValid } from '../components/link-not-valid';
import { ManageBookingForm } from '../components/manage-booking-form';
import { PublicFrame } from '../components/public-frame';
import { STATUS_COLORS, STATUS_LABELS, formatCutoff } from '../format';
import type { PublicBooking } from '../types';

function ReadOnlyReason({ booking }: { booking: PublicBooking }) {
  if (booking.status === 'cancelled') {
    return (
      <Alert color="gray" icon={<IconInfoCircle size={20} />} title="This drop-off is cancelled">
        To drop shears off after all, book again.
      </Alert>
    );
  }
  if (booking.status === 'checked-in') {
    return (
      <Alert color="brass" icon={<IconInfoCircle size={20} />} title="Your shears are checked in">
        The sharpener has them now, so the booking can no longer be changed here.
      </Alert>
    );
  }
  return (
    <Alert color="brass" icon={<IconClockOff size={20} />} title="Changes are closed">
      {booking.cutoff
        ? `Changes and cancelling closed at ${formatCutoff(booking.cutoff)}, so the sharpener can plan the day.`
        : 'Changes and cancelling are closed, so the sharpener can plan the day.'}{' '}
      To change anything now, answer the confirmation e-mail or call the office.
    </Alert>
  );
}

function ManagedBooking({ token, booking }: { token: string; booking: PublicBooking }) {
  const open = booking.changeable && booking.status === 'booked';
  return (
    <Stack gap="lg">
      <Group justify="space-between" gap="sm">
        <Text fw={600}>Booked for {booking.name}</Text>
        <Badge color={STATUS_COLORS[booking.status]} size="lg" variant="light">
          {STATUS_LABELS[booking.status]}
        </Badge>
      </Group>
      <BookingFacts booking={booking} />
      {open ? (
        <>
          {booking.cutoff ? (
            <Text size="sm" c="dimmed">
              You can change or cancel until {formatCutoff(booking.cutoff)}.
            </Text>
          ) : null}
          <ManageBookingForm token={token} booking={booking} />
          <CancelBooking token={token} booking={booking} />
        </>
      ) : (
        <ReadOnlyReason booking={booking} />
      )}
    </Stack>
  );
}

/** The private page of a booking, reached from the confirmation e-mail's link; no sign-in. */
export function ManageBookingRoute() {
  const { token = '' } = useParams();
  const booking = useManagedBooking(token);
  const notValid = booking.error instanceof ApiError && [400, 404, 410].includes(booking.error.status);

  return (
    <PublicFrame title="Your drop-off">
      {booking.isPending ? (
        <PageLoader label="Loading your drop-off" />
      ) : notValid ? (
        <BookingLinkNotValid />
      ) : booking.isError ? (
        <ListLoadFailed
          title="Your drop-off could not be loaded"
          message={booking.error.message}
          onRetry={() => void booking.refetch()}
        />
      ) : (
        <ManagedBooking token={token} booking={booking.data} />
      )}
    </PublicFrame>
  );
}
