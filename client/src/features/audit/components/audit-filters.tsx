import { Group, Paper, Select, TextInput } from '@mantine/core';
import { IconSearch } from '@tabler/icons-react';
import { useSearchBox } from '@/hooks/use-search-box';
import type { AuditSearch } from '../hooks/use-audit-search';
import { AUDIT_ACTION_LABELS } from '../labels';
import { AUDIT_ACTIONS, type AuditAction } from '../types';

const KIND_OPTIONS = [
  { value: 'all', label: 'Every kind' },
  ...AUDIT_ACTIONS.map((action) => ({ value: action, label: AUDIT_ACTION_LABELS[action] })),
];

interface AuditFiltersProps {
  params: AuditSearch;
  update: (changes: Partial<AuditSearch>) => void;
}

/** Kind, who and which days: each change goes to the URL and starts again at page 1. */
export function AuditFilters({ params, update }: AuditFiltersProps) {
  const actor = useSearchBox(params.actor, (value) => update({ actor: value, page: 1 }));
  return (
    <Paper withBorder radius="lg" p="md" role="search" aria-label="Audit log filters">
      <Group gap="md" align="flex-end" wrap="wrap">
        <Select
          label="Kind"
          data={KIND_OPTIONS}
          value={params.action}
          onChange={(value) => update({ action: (value ?? 'all') as AuditAction | 'all', page: 1 })}
          allowDeselect={false}
          w={240}
        />
        <TextInput
          label="Who"
          placeholder="Part of an e-mail address"
          leftSection={<IconSearch size={18} aria-hidden="true" />}
          value={actor.text}
          onChange={(event) => actor.change(event.currentTarget.value)}
          onKeyDown={(event) => event.key === 'Enter' && actor.flush()}
          type="search"
          style={{ flex: '1 1 16rem' }}
          maw={360}
        />
        <TextInput
          type="date"
          label="From"
          value={params.from}
          onChange={(event) => update({ from: event.currentTarget.value, page: 1 })}
          w={170}
        />
        <TextInput
          type="date"
          label="To"
          value={params.to}
          onChange={(event) => update({ to: event.currentTarget.value, page: 1 })}
          w={170}
        />
      </Group>
    </Paper>
  );
}
