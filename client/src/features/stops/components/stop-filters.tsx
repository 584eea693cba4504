import { Group, Select, TextInput } from '@mantine/core';
import { useDebouncedCallback } from '@mantine/hooks';
import { IconSearch } from '@tabler/icons-react';
import { STOP_KINDS } from '@keenroute/shared';
import { useEffect, useState } from 'react';
import { kindLabel } from '../format';
import type { ActiveFilter, SortOrder, StopListParams, StopSort } from '../types';
import { SharpenerSelect } from './sharpener-select';

const KIND_CHOICES = STOP_KINDS.map((kind) => ({ value: kind, label: kindLabel(kind) }));

const ACTIVE_CHOICES: { value: ActiveFilter; label: string }[] = [
  { value: 'true', label: 'Active stops' },
  { value: 'false', label: 'Inactive stops' },
  { value: 'all', label: 'All stops' },
];

const SORT_CHOICES = [
  { value: 'name:asc', label: 'Name, A to Z' },
  { value: 'name:desc', label: 'Name, Z to A' },
  { value: 'nextDueOn:asc', label: 'Next due, soonest first' },
  { value: 'city:asc', label: 'City' },
  { value: 'kind:asc', label: 'Kind' },
  { value: 'createdAt:desc', label: 'Newest first' },
];

interface StopFiltersProps {
  params: StopListParams;
  update: (changes: Partial<StopListParams>) => void;
  showSharpener: boolean;
  showSort: boolean;
}

export function StopFilters({ params, update, showSharpener, showSort }: StopFiltersProps) {
  const [search, setSearch] = useState(params.q);
  const searchFor = useDebouncedCallback((q: string) => update({ q: q.trim(), page: 1 }), 300);
  // Back and forward change the URL's search; the box follows it.
  useEffect(() => {
    setSearch((current) => (current.trim() === params.q ? current : params.q));
  }, [params.q]);

  // Two filters fit side by side on a 360 px phone.
  const grow = { flex: '1 1 9rem' };
  return (
    <Group gap="sm" align="flex-end">
      <TextInput
        aria-label="Search the stops"
        placeholder="Search by name or address"
        leftSection={<IconSearch size={18} aria-hidden="true" />}
        value={search}
        onChange={(event) => {
          setSearch(event.currentTarget.value);
          searchFor(event.currentTarget.value);
        }}
        type="search"
        style={{ flex: '2 1 16rem' }}
      />
      <Select
        aria-label="Kind of stop"
        placeholder="Every kind"
        data={KIND_CHOICES}
        value={params.kind || null}
        onChange={(kind) => update({ kind: kind ?? '', page: 1 })}
        clearable
        style={grow}
      />
      {showSharpener ? (
        <SharpenerSelect
          aria-label="Sharpener"
          placeholder="Every sharpener"
          value={params.sharpener || null}
          onChange={(sharpener) => update({ sharpener: sharpener ?? '', page: 1 })}
          style={grow}
        />
      ) : null}
      <Select
        aria-label="Active or not"
        data={ACTIVE_CHOICES}
        value={params.active}
        onChange={(active) => update({ active: active ?? 'true', page: 1 })}
        allowDeselect={false}
        style={grow}
      />
      {showSort ? (
        <Select
          aria-label="Sort the stops"
          data={SORT_CHOICES}
          value={`${params.sort}:${params.order}`}
          onChange={(value) => {
            if (!value) return;
            const [sort, order] = value.split(':') as [StopSort, SortOrder];
            update({ sort, order, page: 1 });
          }}
          allowDeselect={false}
          style={grow}
        />
      ) : null}
    </Group>
  );
}
