import { useMutation, useQueryClient } from '@tanstack/react-query';
import { publicRequest } from '@/features/bookings/api/public-request';
import { ApiError } from '@/lib/api-error';
import { leaveForCheckout } from '../leave-for-checkout';
import { rememberPaidBefore } from '../paid-before';
import type { CheckoutStarted } from '../types';
import { payLinkKeys, payLinkPath } from './keys';

export function startCheckout(token: string): Promise<CheckoutStarted> {
  return publicRequest<CheckoutStarted>(`${payLinkPath(token)}/checkout`, { method: 'POST' });
}

/**
 * Opens a checkout for what is owed now and goes there. A 409 (paid meanwhile, or void) is shown on the page,
 * which then reloads the invoice to show why.
 */
export function useStartCheckout(token: string, paidCentsNow: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => startCheckout(token),
    meta: { handlesError: (error) => error.status === 409 },
    onSuccess: ({ url }) => {
      rememberPaidBefore(token, paidCentsNow);
      leaveForCheckout(url);
    },
    onError: async (error) => {
      if (error instanceof ApiError && error.status === 409) {
        await queryClient.invalidateQueries({ queryKey: payLinkKeys.invoice(token) });
      }
    },
  });
}
