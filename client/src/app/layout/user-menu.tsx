import { Button, Group, Stack, Text } from '@mantine/core';
import { IconLogout } from '@tabler/icons-react';
import { RoleBadge } from '@/components/role-badge';
import { useLogout } from '@/features/auth/api/logout';
import type { SessionUser } from '@/lib/session';

export function SignedInAs({ user }: { user: SessionUser }) {
  return (
    <Stack gap={2} align="flex-end" data-testid="signed-in-as">
      <Text fw={600} size="sm" lh={1.2}>
        {user.name}
      </Text>
      <RoleBadge role={user.role} size="sm" />
    </Stack>
  );
}

export function SignOutButton({ compact = false }: { compact?: boolean }) {
  const logout = useLogout();
  return (
    <Button
      variant="default"
      leftSection={<IconLogout size={18} aria-hidden="true" />}
      onClick={() => logout.mutate()}
      loading={logout.isPending}
      px={compact ? 'sm' : undefined}
    >
      Sign out
    </Button>
  );
}

export function UserCard({ user }: { user: SessionUser }) {
  return (
    <Group justify="space-between" wrap="nowrap" gap="sm">
      <div style={{ minWidth: 0 }}>
        <Text fw={600} truncate>
          {user.name}
        </Text>
        <Text size="sm" c="dimmed" truncate>
          {user.email}
        </Text>
      </div>
      <RoleBadge role={user.role} />
    </Group>
  );
}
