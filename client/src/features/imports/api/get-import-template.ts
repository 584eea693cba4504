import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { saveFile } from '../save-file';
import type { ImportKind } from '../types';

export const importsQueryKey = ['imports'] as const;

export function getImportTemplate(kind: ImportKind, signal?: AbortSignal): Promise<Blob> {
  return api.blob(`/imports/templates/${kind}`, { signal });
}

export function getImportTemplateQueryOptions(kind: ImportKind) {
  return queryOptions({
    queryKey: [...importsQueryKey, 'template', kind],
    queryFn: ({ signal }) => getImportTemplate(kind, signal),
    // A template only changes with a new release.
    staleTime: Infinity,
  });
}

/** Fetches the template (once per kind) and saves it as a file. */
export function useDownloadTemplate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (kind: ImportKind) => {
      saveFile(await queryClient.fetchQuery(getImportTemplateQueryOptions(kind)), `keenroute-${kind}-template.csv`);
    },
  });
}
