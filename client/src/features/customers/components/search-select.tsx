import { Loader, Select, Stack, Text, type ComboboxItem } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';

export interface SearchOption {
  id: string;
  name: string;
  /** A second line in the dropdown, such as a stop's city. */
  hint?: string;
}

export interface SearchSelectProps {
  label: string;
  value: string | null;
  onChange: (value: string | null, option: SearchOption | null) => void;
  /** The options the server answered for the current query. */
  options: readonly SearchOption[];
  /** The chosen record when it is known, so its name shows before any search. */
  selected?: SearchOption | null;
  onQueryChange: (q: string) => void;
  loading?: boolean;
  placeholder?: string;
  description?: ReactNode;
  error?: ReactNode;
  required?: boolean;
  clearable?: boolean;
  disabled?: boolean;
  nothingFound?: string;
  'data-autofocus'?: boolean;
  w?: number | string;
  style?: React.CSSProperties;
}

/** A Select whose options come from the server as the person types (the first page when nothing is typed). */
export function SearchSelect({
  label,
  value,
  onChange,
  options,
  selected,
  onQueryChange,
  loading = false,
  nothingFound = 'Nothing matches',
  ...rest
}: SearchSelectProps) {
  const known = useRef(new Map<string, SearchOption>());
  for (const option of options) known.current.set(option.id, option);
  if (selected) known.current.set(selected.id, selected);
  const current = value ? (known.current.get(value) ?? null) : null;

  const [search, setSearch] = useState('');
  const [debounced] = useDebouncedValue(search, 250);
  // Once chosen, the box shows the name; that is not a search, so the whole first page stays on offer.
  const q = current && debounced === current.name ? '' : debounced.trim();
  useEffect(() => onQueryChange(q), [q, onQueryChange]);

  const data = useMemo(() => {
    const items: ComboboxItem[] = options.map((option) => ({ value: option.id, label: option.name }));
    if (current && !items.some((item) => item.value === current.id)) {
      items.unshift({ value: current.id, label: current.name });
    }
    return items;
  }, [options, current]);

  return (
    <Select
      label={label}
      searchable
      data={data}
      value={value}
      onChange={(next) => onChange(next, next ? (known.current.get(next) ?? null) : null)}
      searchValue={search}
      onSearchChange={setSearch}
      // The server has filtered already; filtering again would hide names matched by e-mail or address.
      filter={({ options: all }) => all}
      nothingFoundMessage={loading ? 'Searching…' : nothingFound}
      rightSection={loading ? <Loader size="xs" /> : undefined}
      renderOption={({ option }) => {
        const hint = known.current.get(option.value)?.hint;
        return (
          <Stack gap={0}>
            <Text size="sm">{option.label}</Text>
            {hint ? (
              <Text size="xs" c="dimmed">
                {hint}
              </Text>
            ) : null}
          </Stack>
        );
      }}
      comboboxProps={{ withinPortal: true }}
      {...rest}
    />
  );
}
