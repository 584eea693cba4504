import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CalendarFeed } from '../types';
import { calendarFeedQueryKey } from './keys';

/** The caller's own secret iCalendar address; the server makes one on the first call. */
export function getCalendarFeed(signal?: AbortSignal): Promise<CalendarFeed> {
  return api.get<CalendarFeed>('/route-days/calendar-feed', { signal });
}

export function getCalendarFeedQueryOptions() {
  return queryOptions({ queryKey: calendarFeedQueryKey, queryFn: ({ signal }) => getCalendarFeed(signal) });
}

export function useCalendarFeed() {
  return useQuery(getCalendarFeedQueryOptions());
}

export function renewCalendarFeed(): Promise<CalendarFeed> {
  return api.post<CalendarFeed>('/route-days/calendar-feed/renew');
}

/** A new address; the old one stops working, so calendars that used it must be given the new one. */
export function useRenewCalendarFeed() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: renewCalendarFeed,
    onSuccess: (feed) => queryClient.setQueryData(calendarFeedQueryKey, feed),
  });
}
