import { Card, Group, Stack, Text } from '@mantine/core';
import { RoleBadge } from '@/components/role-badge';
import type { SessionUser } from '@/lib/session';
import type { TeamMember } from '../types';
import { MemberActions } from './member-actions';
import { added, lastSignIn, YouBadge } from './member-details';
import { StatusBadge } from './status-badge';

/** The phone's view of the team: one card per person, actions within thumb reach. */
export function TeamCards({ members, actor }: { members: TeamMember[]; actor: SessionUser }) {
  return (
    <Stack gap="sm" component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
      {members.map((member) => (
        <Card key={member.id} component="li" withBorder padding="md" radius="md">
          <Group justify="space-between" align="flex-start" wrap="nowrap" gap="xs">
            <div style={{ minWidth: 0 }}>
              <Text fw={600}>
                {member.name}
                {member.id === actor.id ? <YouBadge /> : null}
              </Text>
              <Text size="sm" c="dimmed" style={{ overflowWrap: 'anywhere' }}>
                {member.email}
              </Text>
            </div>
            <MemberActions member={member} actor={actor} />
          </Group>
          <Group gap="xs" mt="sm">
            <RoleBadge role={member.role} />
            <StatusBadge status={member.status} />
          </Group>
          <Text size="xs" c="dimmed" mt="xs">
            Last signed in: {lastSignIn(member)} · Added {added(member)}
          </Text>
        </Card>
      ))}
    </Stack>
  );
}
