import { useQuery, useQueryClient } from '@tanstack/react-query';
import { publicRequest } from '@/features/bookings/api/public-request';
import type { PaymentStatusPoll } from '../types';
import { isLinkNotValid } from './get-public-invoice';
import { payLinkKeys, payLinkPath } from './keys';

export function getPaymentStatus(token: string, signal?: AbortSignal): Promise<PaymentStatusPoll> {
  return publicRequest<PaymentStatusPoll>(`${payLinkPath(token)}/status`, { signal });
}

export interface PollPlan {
  everyMs: number;
  maxPolls: number;
  /** A new round starts the count again ("Check again"). */
  round: number;
  /** Stops the polling once the answer is final. */
  isFinal: (poll: PaymentStatusPoll) => boolean;
}

interface PollState {
  data?: PaymentStatusPoll;
  error: unknown;
  dataUpdateCount: number;
  errorUpdateCount: number;
}

function nextPollIn(state: PollState | undefined, plan: PollPlan): number | false {
  if (!state) return plan.everyMs;
  if (state.data && plan.isFinal(state.data)) return false;
  if (isLinkNotValid(state.error)) return false;
  return state.dataUpdateCount + state.errorUpdateCount >= plan.maxPolls ? false : plan.everyMs;
}

/** Asks the server for the invoice's status every few seconds until it is final or the polls run out. */
export function usePaymentStatus(token: string, plan: PollPlan) {
  const queryClient = useQueryClient();
  const queryKey = [...payLinkKeys.status(token), plan.round] as const;
  const query = useQuery({
    queryKey,
    queryFn: ({ signal }) => getPaymentStatus(token, signal),
    // The interval is the retry; a failed poll is shown on the page, not as a notice.
    retry: false,
    staleTime: 0,
    meta: { handlesError: () => true },
    refetchInterval: (current) => nextPollIn(current.state, plan),
  });
  const state = queryClient.getQueryState<PaymentStatusPoll>(queryKey);
  const polling = nextPollIn(state, plan) !== false;
  return { ...query, polling };
}
