import { Chip, Group, Stack, TextInput } from '@mantine/core';
import { IconSearch } from '@tabler/icons-react';
import { useSearchBox } from '@/hooks/use-search-box';
import { INVOICE_STATUS_LABELS } from '../labels';
import { INVOICE_FILTERS, type InvoiceFilter, type InvoiceSearch } from '../hooks/use-invoice-search';

const FILTER_LABELS: Record<InvoiceFilter, string> = { all: 'All', ...INVOICE_STATUS_LABELS, overdue: 'Overdue' };

interface InvoiceFiltersProps {
  params: InvoiceSearch;
  update: (changes: Partial<InvoiceSearch>) => void;
}

export function InvoiceFilters({ params, update }: InvoiceFiltersProps) {
  const search = useSearchBox(params.q, (q) => update({ q, page: 1 }));
  return (
    <Stack gap="sm">
      <TextInput
        label="Search invoices"
        placeholder="Number, customer or stop"
        leftSection={<IconSearch size={18} aria-hidden="true" />}
        value={search.text}
        onChange={(event) => search.change(event.currentTarget.value)}
        onKeyDown={(event) => event.key === 'Enter' && search.flush()}
        type="search"
        maw={480}
      />
      <Chip.Group value={params.status} onChange={(value) => update({ status: value, page: 1 })}>
        <Group gap="xs" role="radiogroup" aria-label="Show">
          {INVOICE_FILTERS.map((filter) => (
            <Chip key={filter} value={filter} size="md" color={filter === 'overdue' ? 'red' : 'keenTeal'}>
              {FILTER_LABELS[filter]}
            </Chip>
          ))}
        </Group>
      </Chip.Group>
    </Stack>
  );
}
