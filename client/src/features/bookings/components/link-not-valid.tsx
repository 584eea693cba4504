import { Alert, Button, Stack } from '@mantine/core';
import { IconLinkOff } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

export function BookingLinkNotValid() {
  return (
    <Stack gap="md">
      <Alert color="brass" icon={<IconLinkOff size={20} />} title="This link is not valid or has expired">
        The link to change or cancel a drop-off works only as sent in its confirmation e-mail, and not once the booking
        is done with. Check that the whole link was copied, or book again.
      </Alert>
      <Button component={Link} to={paths.bookings.book.getHref()} mih={44}>
        Book a drop-off
      </Button>
    </Stack>
  );
}
