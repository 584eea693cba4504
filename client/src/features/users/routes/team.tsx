import { Button, Group, Pagination, Select, Stack, Text, TextInput } from '@mantine/core';
import { useDisclosure, useMediaQuery } from '@mantine/hooks';
import { IconSearch, IconUserPlus } from '@tabler/icons-react';
import { PageHeader } from '@/components/page-header';
import { useSearchBox } from '@/hooks/use-search-box';
import { useSignedInUser } from '@/lib/session';
import { useUsers } from '../api/get-users';
import { InviteMemberModal } from '../components/invite-member-modal';
import { TeamCards } from '../components/team-cards';
import { TeamEmpty, TeamLoadFailed, TeamLoading } from '../components/team-list-states';
import { TeamTable } from '../components/team-table';
import { useTeamSearch } from '../hooks/use-team-search';
import type { SortOrder, TeamSort } from '../types';

const SORT_CHOICES = [
  { value: 'name:asc', label: 'Name, A to Z' },
  { value: 'name:desc', label: 'Name, Z to A' },
  { value: 'email:asc', label: 'E-mail, A to Z' },
  { value: 'role:asc', label: 'Role' },
  { value: 'createdAt:desc', label: 'Newest first' },
  { value: 'createdAt:asc', label: 'Oldest first' },
];

export function TeamRoute() {
  const actor = useSignedInUser();
  const { params, update, sortBy } = useTeamSearch();
  const list = useUsers(params);
  // Cards up to tablet width: beside the navbar, seven columns only fit from the md breakpoint.
  const showCards = useMediaQuery('(max-width: 62em)', false, { getInitialValueInEffect: false });
  const [inviteOpened, inviteModal] = useDisclosure(false);

  // Follows back and forward, and ignores the URL echoing a search while more letters are being typed.
  const search = useSearchBox(params.q, (q) => update({ q, page: 1 }));

  const total = list.data?.total ?? 0;
  const members = list.data?.items ?? [];
  const pages = Math.max(1, Math.ceil(total / params.pageSize));
  const first = total === 0 ? 0 : (params.page - 1) * params.pageSize + 1;
  const last = Math.min(total, params.page * params.pageSize);

  return (
    <Stack gap="md" maw={1200}>
      <PageHeader
        title="Team"
        description="Everyone who signs in to Keenroute, and what their role lets them do."
        actions={
          <Button leftSection={<IconUserPlus size={18} />} onClick={inviteModal.open}>
            Invite someone
          </Button>
        }
      />

      <Group gap="sm" align="flex-end">
        <TextInput
          aria-label="Search the team"
          placeholder="Search by name or e-mail"
          leftSection={<IconSearch size={18} aria-hidden="true" />}
          value={search.text}
          onChange={(event) => search.change(event.currentTarget.value)}
          type="search"
          style={{ flex: '1 1 16rem' }}
        />
        {showCards ? (
          <Select
            aria-label="Sort the team"
            data={SORT_CHOICES}
            value={`${params.sort}:${params.order}`}
            onChange={(value) => {
              if (!value) return;
              const [sort, order] = value.split(':') as [TeamSort, SortOrder];
              update({ sort, order, page: 1 });
            }}
            allowDeselect={false}
            w="100%"
          />
        ) : null}
      </Group>

      {list.isPending ? (
        <TeamLoading />
      ) : list.isError ? (
        <TeamLoadFailed message={list.error.message} onRetry={() => void list.refetch()} />
      ) : members.length === 0 ? (
        <TeamEmpty search={params.q} onClear={search.clear} />
      ) : showCards ? (
        <TeamCards members={members} actor={actor} />
      ) : (
        <TeamTable members={members} actor={actor} params={params} onSort={sortBy} />
      )}

      {total > 0 ? (
        <Group justify="space-between" gap="sm">
          <Text size="sm" c="dimmed" aria-live="polite">
            {first}–{last} of {total}
            {list.isPlaceholderData ? ' · loading…' : ''}
          </Text>
          {pages > 1 ? (
            <Pagination
              total={pages}
              value={Math.min(params.page, pages)}
              onChange={(page) => update({ page })}
              size="md"
              getControlProps={(control) => ({ 'aria-label': `${control} page` })}
            />
          ) : null}
        </Group>
      ) : null}

      <InviteMemberModal actorRole={actor.role} opened={inviteOpened} onClose={inviteModal.close} />
    </Stack>
  );
}
