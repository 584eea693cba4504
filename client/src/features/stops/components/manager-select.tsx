import { Select, type SelectProps } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { useState } from 'react';
import { useClientAccounts } from '../api/get-client-accounts';

type ManagerSelectProps = Omit<SelectProps, 'data' | 'value' | 'onChange'> & {
  value: string | null;
  onChange: (userId: string | null) => void;
  current?: { id: string; name: string } | null;
};

/** A client account to be the stop's shop manager; searched on the server, since clients can be many. */
export function ManagerSelect({ value, onChange, current, ...props }: ManagerSelectProps) {
  const [search, setSearch] = useState('');
  const [q] = useDebouncedValue(search.trim(), 250);
  const accounts = useClientAccounts(q);
  const data = (accounts.data ?? []).map((user) => ({ value: user.id, label: user.name }));
  if (current && !data.some((option) => option.value === current.id)) {
    data.unshift({ value: current.id, label: current.name });
  }
  return (
    <Select
      data={data}
      value={value}
      onChange={onChange}
      searchable
      clearable
      searchValue={search}
      onSearchChange={setSearch}
      filter={({ options }) => options}
      nothingFoundMessage={accounts.isPending ? 'Loading…' : 'No client account by that name'}
      {...props}
    />
  );
}
