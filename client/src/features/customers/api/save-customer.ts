import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isFieldError } from '@/lib/form-errors';
import type { AppMeta } from '@/lib/query-client';
import type { CustomerDetail, CustomerInput } from '../types';
import { customersQueryKey } from './get-customers';

export function createCustomer(input: CustomerInput): Promise<CustomerDetail> {
  return api.post<CustomerDetail>('/customers', input);
}

export function updateCustomer({ id, changes }: { id: string; changes: Partial<CustomerInput> }) {
  return api.patch<CustomerDetail>(`/customers/${encodeURIComponent(id)}`, changes);
}

// A stop's customer count and a shear's stop follow the customer, so those lists are stale too.
function invalidateAfterSave(queryClient: QueryClient) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: customersQueryKey }),
    queryClient.invalidateQueries({ queryKey: ['stops'] }),
    queryClient.invalidateQueries({ queryKey: ['shears'] }),
  ]);
}

// The form puts these on its fields: bad input, and an e-mail another customer already has.
const formMeta: AppMeta = { handlesError: (error) => isFieldError(error) || error.status === 409 };

export function useCreateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createCustomer, onSuccess: () => invalidateAfterSave(queryClient), meta: formMeta });
}

export function useUpdateCustomer() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateCustomer, onSuccess: () => invalidateAfterSave(queryClient), meta: formMeta });
}
