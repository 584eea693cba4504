import { useDebouncedValue } from '@mantine/hooks';
import { useMemo } from 'react';
import { useQuote } from '../api/get-quote';
import { itemsOf, type ItemRow } from '../booking-rules';
import type { QuoteInput } from '../types';

/** The estimate for the rows as they stand, asked for once typing pauses. */
export function useLiveQuote(stopId: string, rows: readonly ItemRow[]) {
  const items = itemsOf(rows);
  // Compared as text: a new array of the same rows must not restart the pause.
  const key = stopId && items ? JSON.stringify({ stopId, items } satisfies QuoteInput) : '';
  const [settledKey] = useDebouncedValue(key, 400);
  const input = useMemo(() => (settledKey ? (JSON.parse(settledKey) as QuoteInput) : null), [settledKey]);
  const quote = useQuote(input);
  return {
    quote: key ? quote.data : undefined,
    loading: key !== settledKey || quote.isFetching,
    waiting: key === '',
  };
}
