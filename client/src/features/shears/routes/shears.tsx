import { Button, Select, Stack, TextInput } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { normalizeTagCode } from '@keenroute/shared';
import { IconScissors, IconSearch } from '@tabler/icons-react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { ListFooter } from '@/features/customers/components/list-footer';
import { ListEmpty, ListLoadFailed, ListLoading } from '@/components/list-states';
import { useSearchBox } from '@/hooks/use-search-box';
import { useShears } from '../api/get-shears';
import { ShearFilters } from '../components/shear-filters';
import { ShearCards, ShearTable } from '../components/shear-table';
import { TagShortcut } from '../components/tag-shortcut';
import { toShearQuery, useShearSearch } from '../hooks/use-shear-search';
import type { ShearSort, SortOrder } from '../types';

const SORT_CHOICES = [
  { value: 'tagCode:asc', label: 'Tag code' },
  { value: 'make:asc', label: 'Make' },
  { value: 'customer:asc', label: 'Customer' },
  { value: 'lengthIn:asc', label: 'Length, shortest first' },
  { value: 'createdAt:desc', label: 'Newest first' },
];

export function ShearsRoute() {
  const navigate = useNavigate();
  const { params, update, sortBy } = useShearSearch();
  const list = useShears(toShearQuery(params));
  const showCards = useMediaQuery('(max-width: 62em)', false, { getInitialValueInEffect: false });
  const search = useSearchBox(params.q, (q) => update({ q, page: 1 }));
  const shears = list.data?.items ?? [];

  // "KR-000123", "kr 123" or just "123": the shear with that tag code, when the answer for this search has it.
  const typedTag = normalizeTagCode(search.text);
  const answered = !list.isPlaceholderData && search.text.trim() === params.q;
  const tagMatch = typedTag && answered ? shears.find((shear) => shear.tagCode === typedTag) : undefined;
  const filtered = Boolean(params.q || params.edgeType || params.toolKind || params.status);

  return (
    <Stack gap="md" maw={1200}>
      <PageHeader title="Shears" description="Every registered shear, found by its tag code, its make or its owner." />

      <TextInput
        label="Find by tag code, make or customer"
        placeholder="KR-000123, 123, a make or a name"
        leftSection={<IconSearch size={20} aria-hidden="true" />}
        size="lg"
        type="search"
        autoComplete="off"
        value={search.text}
        onChange={(event) => search.change(event.currentTarget.value)}
        onKeyDown={(event) => {
          if (event.key !== 'Enter') return;
          event.preventDefault();
          if (tagMatch) void navigate(paths.shears.detail.getHref(tagMatch.id));
          else search.flush();
        }}
      />
      {tagMatch ? <TagShortcut shear={tagMatch} /> : null}

      <ShearFilters params={params} onChange={update} />
      {showCards ? (
        <Select
          aria-label="Sort shears"
          data={SORT_CHOICES}
          value={`${params.sort}:${params.order}`}
          onChange={(value) => {
            if (!value) return;
            const [sort, order] = value.split(':') as [ShearSort, SortOrder];
            update({ sort, order, page: 1 });
          }}
          allowDeselect={false}
        />
      ) : null}

      {list.isPending ? (
        <ListLoading label="Loading shears" />
      ) : list.isError ? (
        <ListLoadFailed
          title="The shears could not be loaded"
          message={list.error.message}
          onRetry={() => void list.refetch()}
        />
      ) : shears.length === 0 ? (
        <ListEmpty
          icon={<IconScissors size={36} stroke={1.4} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />}
          title={
            params.q
              ? `No shear matches “${params.q}”.`
              : filtered
                ? 'No shear matches these filters.'
                : 'No shears registered yet. Register them from a customer’s page.'
          }
        >
          {filtered ? (
            <Button
              variant="subtle"
              onClick={() => {
                search.clear();
                update({ q: '', edgeType: '', toolKind: '', status: '', page: 1 });
              }}
            >
              Clear the search and filters
            </Button>
          ) : null}
        </ListEmpty>
      ) : showCards ? (
        <ShearCards shears={shears} />
      ) : (
        <ShearTable shears={shears} sorting={{ sort: params.sort, order: params.order, onSort: sortBy }} />
      )}

      <ListFooter
        page={params.page}
        pageSize={params.pageSize}
        total={list.data?.total ?? 0}
        loadingNext={list.isPlaceholderData}
        onPage={(page) => update({ page })}
      />
    </Stack>
  );
}
