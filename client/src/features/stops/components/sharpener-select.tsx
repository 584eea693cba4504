import { Select, type SelectProps } from '@mantine/core';
import { useStaff } from '../api/get-staff';

type SharpenerSelectProps = Omit<SelectProps, 'data' | 'value' | 'onChange'> & {
  value: string | null;
  onChange: (userId: string | null) => void;
  /** A stop's current sharpener stays choosable even when the user list no longer has them. */
  current?: { id: string; name: string } | null;
};

/** Sharpeners and owners, by name; only owner and office may load the user list. */
export function SharpenerSelect({ value, onChange, current, ...props }: SharpenerSelectProps) {
  const staff = useStaff();
  const data = (staff.data ?? []).map((user) => ({ value: user.id, label: user.name }));
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
      nothingFoundMessage={staff.isPending ? 'Loading…' : 'No sharpener by that name'}
      {...props}
    />
  );
}
