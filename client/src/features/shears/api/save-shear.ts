import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isFieldError } from '@/lib/form-errors';
import type { AppMeta } from '@/lib/query-client';
import type { ShearChanges, ShearDetail, ShearInput } from '../types';
import { shearsQueryKey } from './get-shears';

export function createShear(input: ShearInput): Promise<ShearDetail> {
  return api.post<ShearDetail>('/shears', input);
}

export function updateShear({ id, changes }: { id: string; changes: ShearChanges }): Promise<ShearDetail> {
  return api.patch<ShearDetail>(`/shears/${encodeURIComponent(id)}`, changes);
}

// A customer's shear count shows on the customer lists, so those are stale too.
function invalidateAfterSave(queryClient: QueryClient) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: shearsQueryKey }),
    queryClient.invalidateQueries({ queryKey: ['customers'] }),
  ]);
}

// The form puts a 400's field messages on its fields.
const formMeta: AppMeta = { handlesError: (error) => isFieldError(error) };

export function useCreateShear() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createShear, onSuccess: () => invalidateAfterSave(queryClient), meta: formMeta });
}

export function useUpdateShear(options: { handlesFieldErrors?: boolean } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateShear,
    onSuccess: () => invalidateAfterSave(queryClient),
    meta: options.handlesFieldErrors === false ? undefined : formMeta,
  });
}
