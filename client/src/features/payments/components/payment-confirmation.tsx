import { Alert, Button, Loader, Stack, Text } from '@mantine/core';
import { IconCircleCheck, IconCircleOff, IconClockExclamation, IconRefresh } from '@tabler/icons-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { isLinkNotValid } from '../api/get-public-invoice';
import { usePaymentStatus } from '../api/get-payment-status';
import { confirmationFrom } from '../confirmation';
import { recallPaidBefore } from '../paid-before';
import { PayLinkNotValid } from './pay-link-not-valid';

export interface PaymentConfirmationProps {
  token: string;
  /** Every 2 s for about a minute: long enough for the payment service's message, short enough to stay honest. */
  everyMs?: number;
  maxPolls?: number;
}

function BackToInvoice({ token, label = 'See the invoice' }: { token: string; label?: string }) {
  return (
    <Button component={Link} to={paths.pay.page.getHref(token)} variant="light" size="lg" fullWidth>
      {label}
    </Button>
  );
}

/**
 * The page the checkout returns to. Coming back here proves nothing; it waits for the server, which records a
 * payment only when the payment service's signed message arrives, and says "paid" only once the server does.
 */
export function PaymentConfirmation({ token, everyMs = 2000, maxPolls = 30 }: PaymentConfirmationProps) {
  const [round, setRound] = useState(0);
  // Read once: what was paid before this checkout, noted by the pay page in this tab.
  const [paidBefore] = useState(() => recallPaidBefore(token));
  const status = usePaymentStatus(token, {
    everyMs,
    maxPolls,
    round,
    isFinal: (poll) => confirmationFrom(poll, paidBefore) !== 'waiting',
  });
  const outcome = confirmationFrom(status.data, paidBefore);

  if (isLinkNotValid(status.error)) return <PayLinkNotValid />;

  if (outcome === 'paid' || outcome === 'part-paid') {
    return (
      <Stack gap="md" role="status">
        <Alert
          color="green"
          icon={<IconCircleCheck size={22} />}
          title={outcome === 'paid' ? 'Paid. A receipt is on its way.' : 'Payment received. A receipt is on its way.'}
        >
          {outcome === 'paid'
            ? 'The payment is recorded and nothing more is owed on this invoice. The receipt goes to the e-mail address on the invoice.'
            : 'The payment is recorded; part of the invoice is still owed. The receipt goes to the e-mail address on the invoice.'}
        </Alert>
        <BackToInvoice token={token} />
      </Stack>
    );
  }

  if (outcome === 'void') {
    return (
      <Stack gap="md" role="status">
        <Alert color="gray" icon={<IconCircleOff size={22} />} title="This invoice is void">
          It was cancelled, so nothing is owed on it. If a payment was taken, contact whoever sent the invoice.
        </Alert>
        <BackToInvoice token={token} />
      </Stack>
    );
  }

  if (!status.polling) {
    return (
      <Stack gap="md" role="status">
        <Alert color="brass" icon={<IconClockExclamation size={22} />} title="Not confirmed yet">
          The payment service has not confirmed a payment yet. If you finished paying, it shows on the invoice as soon
          as it is confirmed and a receipt is e-mailed; you do not need to pay again.
          {status.isError ? ` (Last check: ${status.error.message})` : ''}
        </Alert>
        <Button
          size="lg"
          fullWidth
          leftSection={<IconRefresh size={20} aria-hidden="true" />}
          onClick={() => setRound((n) => n + 1)}
        >
          Check again
        </Button>
        <BackToInvoice token={token} label="Back to the invoice" />
      </Stack>
    );
  }

  return (
    <Stack gap="md" align="center" ta="center" py="lg" role="status" aria-live="polite">
      <Loader size="lg" color="keenTeal" aria-hidden="true" />
      <Text fw={700} fz="xl">
        Thank you — confirming your payment
      </Text>
      <Text c="dimmed" maw={440}>
        We are waiting for the payment service to confirm it, which usually takes a few seconds. Keep this page open.
      </Text>
    </Stack>
  );
}
