import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isFieldError } from '@/lib/form-errors';
import type { BusinessProfile, BusinessProfileInput } from '../types';
import { businessProfileKeys } from './keys';

export function getBusinessProfile(signal?: AbortSignal): Promise<BusinessProfile> {
  return api.get<BusinessProfile>('/business-profile', { signal });
}

export function getBusinessProfileQueryOptions() {
  return queryOptions({
    queryKey: businessProfileKeys.profile,
    queryFn: ({ signal }) => getBusinessProfile(signal),
  });
}

export function useBusinessProfile() {
  return useQuery(getBusinessProfileQueryOptions());
}

export function saveBusinessProfile(input: BusinessProfileInput): Promise<BusinessProfile> {
  return api.put<BusinessProfile>('/business-profile', input);
}

export function useSaveBusinessProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveBusinessProfile,
    onSuccess: (profile) => queryClient.setQueryData(businessProfileKeys.profile, profile),
    // The form shows bad input on its fields.
    meta: { handlesError: (error) => isFieldError(error) },
  });
}
