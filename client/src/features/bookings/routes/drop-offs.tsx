import { Button, Group, Select, Stack, Text, TextInput } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { IconInbox } from '@tabler/icons-react';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { PageHeader } from '@/components/page-header';
import { useSignedInUser } from '@/lib/session';
import { useBookings } from '../api/get-bookings';
import { BookingCards, BookingsTable } from '../components/bookings-list';
import { STATUS_LABELS } from '../format';
import { useBookingFilters } from '../hooks/use-booking-filters';
import { BOOKING_STATUSES, type BookingStatus } from '../types';

const STATUS_OPTIONS = [
  { value: '', label: 'Any status' },
  ...BOOKING_STATUSES.map((status) => ({ value: status, label: STATUS_LABELS[status] })),
];

/** Drop-offs booked online: the office sees all of them, a sharpener those on their route days. */
export function DropOffsRoute() {
  const user = useSignedInUser();
  const { filters, update, filtered } = useBookingFilters();
  const list = useBookings(filters);
  const showCards = useMediaQuery('(max-width: 48em)', false, { getInitialValueInEffect: false });
  const bookings = list.data?.items ?? [];

  return (
    <Stack gap="md" maw={1200}>
      <PageHeader
        title="Drop-offs"
        description={
          user.role === 'sharpener'
            ? 'Shears booked to be left at the stops of your route days.'
            : 'Shears booked online to be left at a stop for its next route day, or mailed in.'
        }
      />
      <Group gap="sm" align="flex-end" wrap="wrap">
        <TextInput
          type="date"
          label="Day"
          value={filters.day}
          onChange={(event) => update({ day: event.currentTarget.value })}
          style={{ flex: '1 1 10rem' }}
          maw={240}
        />
        <Select
          label="Status"
          data={STATUS_OPTIONS}
          value={filters.status}
          onChange={(value) => update({ status: (value ?? '') as BookingStatus | '' })}
          allowDeselect={false}
          style={{ flex: '1 1 10rem' }}
          maw={240}
        />
        {filtered ? (
          <Button variant="subtle" onClick={() => update({ day: '', status: '', stopId: '' })} mih={44}>
            Clear the filters
          </Button>
        ) : null}
      </Group>

      {list.isPending ? (
        <ListLoading label="Loading the drop-offs" />
      ) : list.isError ? (
        <ListLoadFailed
          title="The drop-offs could not be loaded"
          message={list.error.message}
          onRetry={() => void list.refetch()}
        />
      ) : bookings.length === 0 ? (
        <ListEmpty
          icon={<IconInbox size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
          title={filtered ? 'No drop-offs match these filters.' : 'No drop-offs booked yet.'}
        >
          <Text size="sm" c="dimmed" maw={420}>
            Customers book on the public Book a drop-off page; their bookings show here and on the day sheet.
          </Text>
        </ListEmpty>
      ) : showCards ? (
        <BookingCards bookings={bookings} role={user.role} />
      ) : (
        <BookingsTable bookings={bookings} role={user.role} />
      )}
      {bookings.length > 0 ? (
        <Text size="sm" c="dimmed" aria-live="polite">
          {list.data?.total ?? bookings.length} {bookings.length === 1 ? 'drop-off' : 'drop-offs'}
          {list.isPlaceholderData ? ' · loading…' : ''}
        </Text>
      ) : null}
    </Stack>
  );
}
