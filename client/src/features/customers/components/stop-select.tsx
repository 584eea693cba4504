import { useRef, useState, type ReactNode } from 'react';
import { useStopName, useStopOptions } from '../api/stop-options';
import { SearchSelect, type SearchOption } from './search-select';

interface StopSelectProps {
  label?: string;
  value: string | null;
  onChange: (value: string | null) => void;
  /** The stop already chosen, when its name is known (an existing customer's stop). */
  selected?: SearchOption | null;
  placeholder?: string;
  description?: ReactNode;
  error?: ReactNode;
  clearable?: boolean;
  w?: number | string;
  style?: React.CSSProperties;
}

/** Picks a stop by name or address, from GET /api/stops?q=. */
export function StopSelect({ label = 'Stop', value, onChange, selected, ...rest }: StopSelectProps) {
  const [q, setQ] = useState('');
  const stops = useStopOptions(q);
  const options = (stops.data?.items ?? []).map((stop) => ({ id: stop.id, name: stop.name, hint: stop.city }));
  const seen = useRef(new Set<string>());
  for (const option of options) seen.current.add(option.id);
  // A preset stop may not be on the first page; then its name is asked for once.
  const listed = (value !== null && seen.current.has(value)) || selected?.id === value;
  const named = useStopName(value, Boolean(stops.data) && !listed);
  const chosen = selected ?? (named.data ? { id: named.data.id, name: named.data.name, hint: named.data.city } : null);

  return (
    <SearchSelect
      label={label}
      value={value}
      options={options}
      selected={chosen}
      onQueryChange={setQ}
      loading={stops.isFetching}
      nothingFound="No stop matches"
      placeholder="Search stops by name or address"
      onChange={(next) => onChange(next)}
      {...rest}
    />
  );
}
