import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { showPdf } from '@/features/shears/api/print-labels';
import type { DaySheet } from '../types';
import { sheetQueryKey } from './keys';

export function getSheet(routeDayId: string, signal?: AbortSignal): Promise<DaySheet> {
  return api.get<DaySheet>(`/route-days/${encodeURIComponent(routeDayId)}/sheet`, { signal });
}

export function getSheetQueryOptions(routeDayId: string) {
  return queryOptions({
    queryKey: sheetQueryKey(routeDayId),
    queryFn: ({ signal }) => getSheet(routeDayId, signal),
    // The page says itself that a day is missing.
    meta: { handlesError: (error) => error.status === 404 },
  });
}

export function useSheet(routeDayId: string) {
  return useQuery(getSheetQueryOptions(routeDayId));
}

export function getSheetPdf(routeDayId: string): Promise<Blob> {
  return api.blob(`/route-days/${encodeURIComponent(routeDayId)}/sheet`, { query: { format: 'pdf' } });
}

/** The printable day sheet, opened to print or saved where the browser blocks a new tab. */
export function useSheetPdf() {
  return useMutation({
    mutationFn: async ({ routeDayId, fileName }: { routeDayId: string; fileName: string }) => {
      showPdf(await getSheetPdf(routeDayId), fileName);
    },
  });
}
