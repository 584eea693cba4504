import { Group, Table, Text, UnstyledButton, VisuallyHidden } from '@mantine/core';
import { IconArrowsSort, IconSortAscending, IconSortDescending } from '@tabler/icons-react';
import type { ReactNode } from 'react';
import { RoleBadge } from '@/components/role-badge';
import type { SessionUser } from '@/lib/session';
import type { TeamListParams, TeamMember, TeamSort } from '../types';
import { MemberActions } from './member-actions';
import { added, lastSignIn, YouBadge } from './member-details';
import { StatusBadge } from './status-badge';

interface TeamTableProps {
  members: TeamMember[];
  actor: SessionUser;
  params: TeamListParams;
  onSort: (sort: TeamSort) => void;
}

function SortableHeader({
  column,
  params,
  onSort,
  children,
}: {
  column: TeamSort;
  params: TeamListParams;
  onSort: (sort: TeamSort) => void;
  children: ReactNode;
}) {
  const sorted = params.sort === column;
  const Icon = !sorted ? IconArrowsSort : params.order === 'asc' ? IconSortAscending : IconSortDescending;
  return (
    <Table.Th aria-sort={sorted ? (params.order === 'asc' ? 'ascending' : 'descending') : 'none'}>
      <UnstyledButton onClick={() => onSort(column)} py={6}>
        <Group gap={6} wrap="nowrap">
          <Text fw={700} size="sm">
            {children}
          </Text>
          <Icon size={16} aria-hidden="true" color={sorted ? 'var(--mantine-color-keenTeal-6)' : undefined} />
        </Group>
      </UnstyledButton>
    </Table.Th>
  );
}

export function TeamTable({ members, actor, params, onSort }: TeamTableProps) {
  return (
    <Table.ScrollContainer minWidth={760}>
      <Table verticalSpacing="sm" highlightOnHover striped="even" stripedColor="gray.0">
        <Table.Thead>
          <Table.Tr>
            <SortableHeader column="name" params={params} onSort={onSort}>
              Name
            </SortableHeader>
            <SortableHeader column="email" params={params} onSort={onSort}>
              E-mail
            </SortableHeader>
            <SortableHeader column="role" params={params} onSort={onSort}>
              Role
            </SortableHeader>
            <Table.Th>Status</Table.Th>
            <Table.Th>Last signed in</Table.Th>
            <SortableHeader column="createdAt" params={params} onSort={onSort}>
              Added
            </SortableHeader>
            <Table.Th>
              <VisuallyHidden>Actions</VisuallyHidden>
            </Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {members.map((member) => (
            <Table.Tr key={member.id}>
              <Table.Td miw={180}>
                <Text fw={600} span>
                  {member.name}
                </Text>
                {member.id === actor.id ? <YouBadge /> : null}
              </Table.Td>
              <Table.Td>{member.email}</Table.Td>
              <Table.Td>
                <RoleBadge role={member.role} />
              </Table.Td>
              <Table.Td>
                <StatusBadge status={member.status} />
              </Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>{lastSignIn(member)}</Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>{added(member)}</Table.Td>
              <Table.Td ta="right" h={60}>
                <MemberActions member={member} actor={actor} />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
