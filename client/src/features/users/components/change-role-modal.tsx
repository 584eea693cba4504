import { Button, Group, Modal, Select, Stack, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { canAssignRole, ROLES, type Role } from '@keenroute/shared';
import { useState } from 'react';
import { ROLE_LABELS, ROLE_SUMMARIES } from '@/config/roles';
import { useUpdateUser } from '../api/update-user';
import type { TeamMember } from '../types';

interface ChangeRoleModalProps {
  member: TeamMember;
  actorRole: Role;
  opened: boolean;
  onClose: () => void;
}

export function ChangeRoleModal({ member, actorRole, opened, onClose }: ChangeRoleModalProps) {
  const update = useUpdateUser();
  const [role, setRole] = useState<Role>(member.role);
  const choices = ROLES.filter((candidate) => canAssignRole(actorRole, candidate));

  const save = () => {
    update.mutate(
      { id: member.id, changes: { role } },
      {
        onSuccess: (saved) => {
          notifications.show({
            color: 'keenTeal',
            title: 'Role changed',
            message: `${saved.name} is now ${ROLE_LABELS[saved.role].toLowerCase()}.`,
          });
          onClose();
        },
      },
    );
  };

  return (
    <Modal opened={opened} onClose={onClose} title={`Change ${member.name}'s role`} centered>
      <Stack gap="md">
        <Select
          label="Role"
          data={choices.map((value) => ({ value, label: ROLE_LABELS[value] }))}
          value={role}
          onChange={(value) => value && setRole(value)}
          allowDeselect={false}
          description={ROLE_SUMMARIES[role]}
          comboboxProps={{ withinPortal: true }}
        />
        <Text size="sm" c="dimmed">
          The change applies the next time {member.name} signs in or their session renews, within minutes.
        </Text>
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Cancel
          </Button>
          <Button onClick={save} loading={update.isPending} disabled={role === member.role}>
            Save role
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
