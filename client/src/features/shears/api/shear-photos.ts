import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { api } from '@/lib/api-client';
import type { ShearPhoto } from '../types';
import { shearsQueryKey } from './get-shears';

const photoPath = (shearId: string, photoId: string) =>
  `/shears/${encodeURIComponent(shearId)}/photos/${encodeURIComponent(photoId)}`;

/** The images need the auth header, so they come as blobs and show through object URLs. */
export function useShearPhotoUrl(shearId: string, photoId: string, size: 'thumbnail' | 'full') {
  const blob = useQuery({
    // Not under ['shears']: saving a shear must not fetch every image again.
    queryKey: ['shear-photos', shearId, photoId, size],
    queryFn: ({ signal }) =>
      api.blob(size === 'thumbnail' ? `${photoPath(shearId, photoId)}/thumbnail` : photoPath(shearId, photoId), {
        signal,
      }),
    staleTime: Infinity,
    // A missing picture shows as a placeholder; a notification per thumbnail would bury the page.
    meta: { handlesError: () => true },
  });
  const [url, setUrl] = useState<string | null>(null);
  useEffect(() => {
    if (!blob.data) return undefined;
    const next = URL.createObjectURL(blob.data);
    setUrl(next);
    // Each object URL holds its image in memory until revoked.
    return () => URL.revokeObjectURL(next);
  }, [blob.data]);
  return { url, isPending: blob.isPending, isError: blob.isError };
}

export function useUploadShearPhoto(shearId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('photo', file);
      return api.upload<ShearPhoto>(`/shears/${encodeURIComponent(shearId)}/photos`, form);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shearsQueryKey }),
    // The upload box shows a refusal (wrong kind of file, too large) itself, in the server's words.
    meta: { handlesError: (error) => error.status >= 400 && error.status < 500 && error.status !== 403 },
  });
}

export function useDeleteShearPhoto(shearId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (photoId: string) => api.delete(photoPath(shearId, photoId)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shearsQueryKey }),
  });
}
