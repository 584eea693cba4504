import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { StaffBooking, StaffBookingFilters } from '../types';
import { bookingKeys } from './keys';

interface BookingList {
  items: StaffBooking[];
  total: number;
}

export async function getBookings(filters: StaffBookingFilters, signal?: AbortSignal): Promise<BookingList> {
  const answer = await api.get<BookingList | StaffBooking[]>('/bookings', { query: { ...filters }, signal });
  // The list may come as a page or as a plain array; both read the same here.
  return Array.isArray(answer) ? { items: answer, total: answer.length } : answer;
}

export function getBookingsQueryOptions(filters: StaffBookingFilters) {
  return queryOptions({
    queryKey: bookingKeys.staffList(filters),
    queryFn: ({ signal }) => getBookings(filters, signal),
    placeholderData: keepPreviousData,
  });
}

export function useBookings(filters: StaffBookingFilters) {
  return useQuery(getBookingsQueryOptions(filters));
}
