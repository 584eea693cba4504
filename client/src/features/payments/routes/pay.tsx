import { useParams } from 'react-router-dom';
import { ListLoadFailed } from '@/components/list-states';
import { PageLoader } from '@/components/page-loader';
import { PublicFrame } from '@/features/bookings/components/public-frame';
import { isLinkNotValid, usePublicInvoice } from '../api/get-public-invoice';
import { PayLinkNotValid } from '../components/pay-link-not-valid';
import { PublicInvoiceView } from '../components/public-invoice-view';

/** Pay an invoice: the private link printed on it and sent with it; no sign-in. */
export function PayRoute() {
  const { token = '' } = useParams();
  const invoice = usePublicInvoice(token);
  const data = invoice.data;

  return (
    <PublicFrame
      title={data ? `Invoice ${data.number}` : 'Pay an invoice'}
      description={data ? `From ${data.business.name}` : undefined}
    >
      {invoice.isPending ? (
        <PageLoader label="Loading the invoice" />
      ) : isLinkNotValid(invoice.error) ? (
        <PayLinkNotValid />
      ) : invoice.isError ? (
        <ListLoadFailed
          title="The invoice could not be loaded"
          message={invoice.error.message}
          onRetry={() => void invoice.refetch()}
        />
      ) : (
        <PublicInvoiceView token={token} invoice={invoice.data} />
      )}
    </PublicFrame>
  );
}
