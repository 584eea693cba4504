import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Page, TeamListParams, TeamMember } from '../types';

export const usersQueryKey = ['users'] as const;

export function getUsers(params: TeamListParams, signal?: AbortSignal): Promise<Page<TeamMember>> {
  return api.get<Page<TeamMember>>('/users', { query: { ...params }, signal });
}

export function getUsersQueryOptions(params: TeamListParams) {
  return queryOptions({
    queryKey: [...usersQueryKey, 'list', params],
    queryFn: ({ signal }) => getUsers(params, signal),
    // Keeps the current page on screen while the next one loads.
    placeholderData: keepPreviousData,
  });
}

export function useUsers(params: TeamListParams) {
  return useQuery(getUsersQueryOptions(params));
}
