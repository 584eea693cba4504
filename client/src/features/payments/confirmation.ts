import type { PaymentStatusPoll } from './types';

export type Confirmation = 'waiting' | 'paid' | 'part-paid' | 'void';

/**
 * What the server's answer says about the payment just made. Only the server's status counts: coming back from the
 * checkout proves nothing, since the payment is recorded when the payment service's signed message arrives.
 * "part-paid" counts only when more is paid than before the checkout (an older part-payment is not this one).
 */
export function confirmationFrom(poll: PaymentStatusPoll | undefined, paidBefore: number | null): Confirmation {
  if (!poll) return 'waiting';
  if (poll.status === 'paid') return 'paid';
  if (poll.status === 'void') return 'void';
  if (poll.status === 'part-paid' && paidBefore !== null && poll.paidCents > paidBefore) return 'part-paid';
  return 'waiting';
}
