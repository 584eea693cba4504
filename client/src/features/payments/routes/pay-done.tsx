import { useParams } from 'react-router-dom';
import { PublicFrame } from '@/features/bookings/components/public-frame';
import { PaymentConfirmation } from '../components/payment-confirmation';

/** Where the checkout sends the payer back (?session_id=… is the payment service's; the server needs none of it). */
export function PayDoneRoute() {
  const { token = '' } = useParams();
  return (
    <PublicFrame title="Your payment">
      <PaymentConfirmation token={token} />
    </PublicFrame>
  );
}
