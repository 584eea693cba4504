import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { IMPORT_KINDS, type ImportResult } from '../types';

export function commitImport(id: string): Promise<ImportResult> {
  return api.post<ImportResult>(`/imports/${id}/commit`);
}

export function useCommitImport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: commitImport,
    // New rows change every list's counts (a stop's customers, a customer's shears); each keys its queries by name.
    onSuccess: () => Promise.all(IMPORT_KINDS.map((kind) => queryClient.invalidateQueries({ queryKey: [kind] }))),
    // A refusal carries the rows' problems, which the preview shows in its table.
    meta: { handlesError: (error) => error.status === 400 },
  });
}
