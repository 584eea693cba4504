import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Quote, QuoteInput } from '../types';
import { bookingKeys } from './keys';
import { publicRequest } from './public-request';

export function getQuote(input: QuoteInput, signal?: AbortSignal): Promise<Quote> {
  return publicRequest('/public/bookings/quote', { method: 'POST', body: input, signal });
}

/** The estimate is a read: the same stop and shears give the same answer, so it caches like one. */
export function getQuoteQueryOptions(input: QuoteInput | null) {
  return queryOptions({
    queryKey: bookingKeys.quote(input),
    queryFn: ({ signal }) => getQuote(input!, signal),
    enabled: input !== null,
    placeholderData: keepPreviousData,
  });
}

export function useQuote(input: QuoteInput | null) {
  return useQuery({
    ...getQuoteQueryOptions(input),
    // The form validates the rows itself; a refused estimate just shows no estimate.
    meta: { handlesError: (error) => error.status === 400 },
  });
}
