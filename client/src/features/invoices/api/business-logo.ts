import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { api } from '@/lib/api-client';
import type { BusinessProfile } from '../types';
import { businessProfileKeys } from './keys';

const LOGO_PATH = '/business-profile/logo';

/** The logo needs the auth header, so it comes as a blob and shows through an object URL. */
export function useLogoPreview(logoUrl: string | null) {
  const blob = useQuery({
    // Keyed by the URL the profile gives, so a new upload is fetched again.
    queryKey: businessProfileKeys.logo(logoUrl ?? ''),
    queryFn: ({ signal }) => api.blob(LOGO_PATH, { signal }),
    enabled: logoUrl !== null,
    staleTime: Infinity,
    // A missing picture shows as "no preview"; the upload box says the rest.
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
  return { url: logoUrl ? url : null, isPending: logoUrl !== null && blob.isPending };
}

export function useUploadLogo() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => {
      const form = new FormData();
      form.append('logo', file);
      return api.upload<BusinessProfile | undefined>(LOGO_PATH, form);
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: businessProfileKeys.profile }),
    // The upload box shows a refusal (wrong kind of file, too large) itself, in the server's words.
    meta: { handlesError: (error) => error.status >= 400 && error.status < 500 && error.status !== 403 },
  });
}

export function useRemoveLogo() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api.delete(LOGO_PATH),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: businessProfileKeys.profile }),
  });
}
