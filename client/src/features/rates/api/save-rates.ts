import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RateCard } from '@keenroute/shared';
import { api } from '@/lib/api-client';
import { isFieldError } from '@/lib/form-errors';
import type { SavedRateCard } from '../types';
import { ratesQueryKey } from './get-rates';

export function saveRates(card: RateCard): Promise<SavedRateCard> {
  return api.put<SavedRateCard>('/rates', { card });
}

export function useSaveRates() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveRates,
    // The card in force and its history both change.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ratesQueryKey }),
    // The form marks these on its fields.
    meta: { handlesError: isFieldError },
  });
}
