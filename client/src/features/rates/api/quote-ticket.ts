import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { QuoteRequest, QuoteResponse } from '../types';

export function quoteTicket(request: QuoteRequest): Promise<QuoteResponse> {
  return api.post<QuoteResponse>('/rates/quote', request);
}

export function useQuoteTicket() {
  return useMutation({
    mutationFn: quoteTicket,
    // The quote panel explains a refusal beside the figures (bad input, or no card saved yet).
    meta: { handlesError: (error) => error.status === 400 || error.status === 409 },
  });
}
