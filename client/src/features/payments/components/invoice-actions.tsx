import { Button } from '@mantine/core';
import { IconFileTypePdf, IconLock } from '@tabler/icons-react';
import { useOpenInvoicePdf } from '../api/open-invoice-pdf';
import { money } from '../format';

export function OpenPdfButton({
  id,
  number,
  fullWidth = false,
}: {
  id: string;
  number: string | null;
  fullWidth?: boolean;
}) {
  const pdf = useOpenInvoicePdf();
  return (
    <Button
      variant="default"
      size="md"
      mih={48}
      fullWidth={fullWidth}
      leftSection={<IconFileTypePdf size={20} aria-hidden="true" />}
      loading={pdf.isPending}
      onClick={() => pdf.mutate({ id, number })}
      aria-label={`Open the PDF of ${number ?? 'this invoice'}`}
    >
      PDF
    </Button>
  );
}

/** The invoice's own pay link: the same public page a payer reaches from the e-mail. */
export function PayOnlineLink({
  payUrl,
  balanceCents,
  currency,
}: {
  payUrl: string;
  balanceCents: number;
  currency: string;
}) {
  return (
    <Button component="a" href={payUrl} size="lg" fullWidth leftSection={<IconLock size={20} aria-hidden="true" />}>
      Pay {money(balanceCents, currency)} online
    </Button>
  );
}
