import { useState, type ReactNode } from 'react';
import { useCustomers } from '@/features/customers/api/get-customers';
import { SearchSelect } from '@/features/customers/components/search-select';

interface CustomerSelectProps {
  value: string | null;
  onChange: (value: string | null) => void;
  error?: ReactNode;
  required?: boolean;
}

/** Picks a customer by name or e-mail, from GET /api/customers?q=. */
export function CustomerSelect({ value, onChange, error, required }: CustomerSelectProps) {
  const [q, setQ] = useState('');
  const customers = useCustomers({ q, pageSize: 20, active: true, sort: 'name' });
  const options = (customers.data?.items ?? []).map((customer) => ({
    id: customer.id,
    name: customer.name,
    hint: [customer.stop?.name, customer.email].filter(Boolean).join(' · ') || undefined,
  }));
  return (
    <SearchSelect
      label="Customer"
      value={value}
      onChange={(next) => onChange(next)}
      options={options}
      onQueryChange={setQ}
      loading={customers.isFetching}
      placeholder="Search customers by name or e-mail"
      nothingFound="No customer matches"
      error={error}
      required={required}
      data-autofocus
    />
  );
}
