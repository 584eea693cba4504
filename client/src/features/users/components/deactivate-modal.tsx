import { Button, Group, Modal, Stack, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { useUpdateUser } from '../api/update-user';
import type { TeamMember } from '../types';

interface DeactivateModalProps {
  member: TeamMember;
  opened: boolean;
  onClose: () => void;
}

export function DeactivateModal({ member, opened, onClose }: DeactivateModalProps) {
  const update = useUpdateUser();
  const deactivate = () => {
    update.mutate(
      { id: member.id, changes: { active: false } },
      {
        onSuccess: (saved) => {
          notifications.show({
            color: 'keenTeal',
            title: 'Deactivated',
            message: `${saved.name} can no longer sign in.`,
          });
          onClose();
        },
      },
    );
  };

  return (
    <Modal opened={opened} onClose={onClose} title={`Deactivate ${member.name}?`} centered>
      <Stack gap="md">
        <Text>
          {member.name} ({member.email}) is signed out everywhere and can no longer sign in. Their history stays, and
          you can reactivate them at any time.
        </Text>
        <Group justify="flex-end">
          <Button variant="default" onClick={onClose}>
            Keep active
          </Button>
          <Button color="red" onClick={deactivate} loading={update.isPending}>
            Deactivate
          </Button>
        </Group>
      </Stack>
    </Modal>
  );
}
