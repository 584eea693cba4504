import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { BOOKING_STATUSES, type BookingStatus, type StaffBookingFilters } from '../types';

const isDay = (value: string | null): value is string => value !== null && /^\d{4}-\d{2}-\d{2}$/.test(value);
const isStatus = (value: string | null): value is BookingStatus =>
  (BOOKING_STATUSES as readonly (string | null)[]).includes(value);

/** The drop-offs list's filters live in the URL, so a link from a day or a stop shows the same list. */
export function useBookingFilters() {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = useMemo<StaffBookingFilters>(() => {
    const day = searchParams.get('day');
    const status = searchParams.get('status');
    return {
      day: isDay(day) ? day : '',
      status: isStatus(status) ? status : '',
      stopId: searchParams.get('stopId')?.trim() ?? '',
    };
  }, [searchParams]);

  const update = useCallback(
    (changes: Partial<StaffBookingFilters>) =>
      setSearchParams(
        (previous) => {
          const next = new URLSearchParams(previous);
          for (const [key, value] of Object.entries(changes)) {
            if (value) next.set(key, value);
            else next.delete(key);
          }
          return next;
        },
        { replace: true },
      ),
    [setSearchParams],
  );

  return { filters, update, filtered: filters.day !== '' || filters.status !== '' || filters.stopId !== '' };
}
