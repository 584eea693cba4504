import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AuditListParams, AuditPage } from '../types';
import { auditKeys } from './keys';

export function getAuditLog(params: AuditListParams, signal?: AbortSignal): Promise<AuditPage> {
  return api.get<AuditPage>('/audit', { query: { ...params }, signal });
}

export function getAuditLogQueryOptions(params: AuditListParams = {}) {
  return queryOptions({
    queryKey: auditKeys.list(params),
    queryFn: ({ signal }) => getAuditLog(params, signal),
    // The next page or filter shows over the last one instead of a blank list.
    placeholderData: keepPreviousData,
  });
}

export function useAuditLog(params: AuditListParams = {}, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getAuditLogQueryOptions(params), enabled: options.enabled ?? true });
}
