import { Button, Group, Modal, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconX } from '@tabler/icons-react';
import { useCancelBooking } from '../api/change-booking';
import { formatBookingDay } from '../format';
import type { PublicBooking } from '../types';

/** Cancelling asks once more: the bench time goes back to others and the booking cannot be restored. */
export function CancelBooking({ token, booking }: { token: string; booking: PublicBooking }) {
  const [opened, { open, close }] = useDisclosure(false);
  const cancel = useCancelBooking(token);
  const when =
    booking.mailIn || !booking.day ? 'your mail-in drop-off' : `your drop-off on ${formatBookingDay(booking.day)}`;

  return (
    <>
      <Button
        variant="outline"
        color="red"
        leftSection={<IconX size={18} aria-hidden="true" />}
        onClick={open}
        mih={44}
      >
        Cancel the drop-off
      </Button>
      <Modal opened={opened} onClose={close} title="Cancel this drop-off?" centered>
        <Stack gap="md">
          <Text>
            This cancels {when} at {booking.stop.name}. To drop off later, book again.
          </Text>
          <Group justify="flex-end" gap="sm">
            <Button variant="default" onClick={close} mih={44}>
              Keep it
            </Button>
            <Button
              color="red"
              loading={cancel.isPending}
              mih={44}
              onClick={() => cancel.mutate(undefined, { onSuccess: close })}
            >
              Yes, cancel it
            </Button>
          </Group>
        </Stack>
      </Modal>
    </>
  );
}
