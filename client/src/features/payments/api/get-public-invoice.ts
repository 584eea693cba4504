import { queryOptions, useQuery } from '@tanstack/react-query';
import { publicRequest } from '@/features/bookings/api/public-request';
import { ApiError } from '@/lib/api-error';
import type { PublicInvoice } from '../types';
import { payLinkKeys, payLinkPath } from './keys';

/** A mistyped, cut-off or withdrawn pay link; the page says so instead of a red notice. */
export function isLinkNotValid(error: unknown): boolean {
  return error instanceof ApiError && [400, 404, 410].includes(error.status);
}

export function getPublicInvoice(token: string, signal?: AbortSignal): Promise<PublicInvoice> {
  return publicRequest<PublicInvoice>(payLinkPath(token), { signal });
}

export function getPublicInvoiceQueryOptions(token: string) {
  return queryOptions({
    queryKey: payLinkKeys.invoice(token),
    queryFn: ({ signal }) => getPublicInvoice(token, signal),
  });
}

export function usePublicInvoice(token: string) {
  return useQuery({ ...getPublicInvoiceQueryOptions(token), meta: { handlesError: isLinkNotValid } });
}
