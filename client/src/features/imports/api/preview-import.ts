import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { ImportKind, ImportPreview } from '../types';

export function previewImport({ kind, file }: { kind: ImportKind; file: File }): Promise<ImportPreview> {
  const form = new FormData();
  form.set('kind', kind);
  form.set('file', file, file.name);
  return api.upload<ImportPreview>('/imports', form);
}

export function usePreviewImport() {
  return useMutation({
    mutationFn: previewImport,
    // The page explains a refused file (bad columns, too large) beside the drop zone.
    meta: { handlesError: (error) => error.status === 400 || error.status === 413 },
  });
}
