import { Alert, Button, Stack, Text } from '@mantine/core';
import { IconAlertTriangle, IconLock } from '@tabler/icons-react';
import { ApiError } from '@/lib/api-error';
import { useStartCheckout } from '../api/start-checkout';
import { money } from '../format';
import type { PublicInvoice } from '../types';

/** The one big button of the pay page: it opens a checkout for the whole balance on the payment service's page. */
export function PayOnline({ token, invoice }: { token: string; invoice: PublicInvoice }) {
  const checkout = useStartCheckout(token, invoice.paidCents);
  // After success the browser is on its way to the checkout page; the button stays busy until it has gone.
  const leaving = checkout.isPending || checkout.isSuccess;
  const refused = checkout.error instanceof ApiError && checkout.error.status === 409 ? checkout.error : null;

  return (
    <Stack gap="xs">
      <Button
        size="xl"
        fullWidth
        leftSection={<IconLock size={22} aria-hidden="true" />}
        loading={leaving}
        loaderProps={{ type: 'dots' }}
        onClick={() => checkout.mutate()}
      >
        Pay {money(invoice.balanceCents, invoice.currency)} online
      </Button>
      <Text size="sm" c="dimmed" ta="center">
        {leaving
          ? 'Opening the secure payment page…'
          : 'You pay on our payment service’s secure page; your card details never reach us.'}
      </Text>
      {refused ? (
        <Alert color="brass" icon={<IconAlertTriangle size={20} />} title="This invoice cannot be paid online now">
          {refused.message}
        </Alert>
      ) : null}
    </Stack>
  );
}
