import { Group, Select } from '@mantine/core';
import type { ShearSearch } from '../hooks/use-shear-search';
import { EDGE_TYPE_OPTIONS, STATUS_OPTIONS, TOOL_KIND_OPTIONS } from '../labels';

interface ShearFiltersProps {
  params: ShearSearch;
  onChange: (changes: Partial<ShearSearch>) => void;
}

/** Edge type, tool kind and status; empty means any. */
export function ShearFilters({ params, onChange }: ShearFiltersProps) {
  const common = { clearable: true, comboboxProps: { withinPortal: true }, style: { flex: '1 1 10rem' } };
  return (
    <Group gap="sm" align="flex-end" wrap="wrap">
      <Select
        label="Edge type"
        placeholder="Any edge type"
        data={EDGE_TYPE_OPTIONS}
        value={params.edgeType || null}
        onChange={(value) => onChange({ edgeType: value ?? '', page: 1 })}
        {...common}
      />
      <Select
        label="Tool kind"
        placeholder="Any tool kind"
        data={TOOL_KIND_OPTIONS}
        value={params.toolKind || null}
        onChange={(value) => onChange({ toolKind: value ?? '', page: 1 })}
        {...common}
      />
      <Select
        label="Status"
        placeholder="Any status"
        data={STATUS_OPTIONS}
        value={params.status || null}
        onChange={(value) => onChange({ status: value ?? '', page: 1 })}
        {...common}
      />
    </Group>
  );
}
