import { Button, Group, Modal, Select, Stack, Text, TextInput } from '@mantine/core';
import { isEmail, useForm } from '@mantine/form';
import { notifications } from '@mantine/notifications';
import { canAssignRole, ROLES, type Role } from '@keenroute/shared';
import { ROLE_LABELS, ROLE_SUMMARIES } from '@/config/roles';
import { ApiError } from '@/lib/api-error';
import { showFieldErrors } from '@/lib/form-errors';
import { useInviteUser, type InvitationInput } from '../api/invite-user';

interface InviteMemberModalProps {
  actorRole: Role;
  opened: boolean;
  onClose: () => void;
}

interface InviteValues {
  name: string;
  email: string;
  role: Role | null;
}

export function InviteMemberModal({ actorRole, opened, onClose }: InviteMemberModalProps) {
  const invite = useInviteUser();
  const roles = ROLES.filter((role) => canAssignRole(actorRole, role));
  const form = useForm<InviteValues, InvitationInput>({
    initialValues: { name: '', email: '', role: null },
    validate: {
      name: (value) => (value.trim() ? null : 'Enter the name they go by.'),
      email: isEmail('Enter an e-mail address, for example name@salon.test.'),
      role: (value) => (value && roles.includes(value) ? null : 'Choose what they will do in Keenroute.'),
    },
    transformValues: (values) => ({
      name: values.name.trim(),
      email: values.email.trim(),
      role: values.role ?? 'client',
    }),
  });

  const close = () => {
    form.reset();
    invite.reset();
    onClose();
  };

  const submit = form.onSubmit((values) => {
    invite.mutate(values, {
      onSuccess: (member) => {
        notifications.show({
          color: 'keenTeal',
          title: 'Invitation sent',
          message: `${member.name} gets an e-mail at ${member.email} with a link to set a password.`,
        });
        close();
      },
      onError: (error) => {
        if (showFieldErrors(form, error)) return;
        if (error instanceof ApiError && error.status === 409) form.setFieldError('email', error.message);
      },
    });
  });

  const role = form.values.role;
  return (
    <Modal opened={opened} onClose={close} title="Invite someone to Keenroute" centered size="lg">
      <form onSubmit={submit} noValidate>
        <Stack gap="md">
          <Text size="sm" c="dimmed">
            They get an e-mail with a link to set their own password. The link works once.
          </Text>
          <TextInput label="Name" autoComplete="off" required data-autofocus {...form.getInputProps('name')} />
          <TextInput label="E-mail" type="email" autoComplete="off" required {...form.getInputProps('email')} />
          <Select
            label="Role"
            placeholder="Choose a role"
            required
            data={roles.map((value) => ({ value, label: ROLE_LABELS[value] }))}
            description={role ? ROLE_SUMMARIES[role] : 'What they will do in Keenroute.'}
            allowDeselect={false}
            {...form.getInputProps('role')}
          />
          <Group justify="flex-end" mt="sm">
            <Button variant="default" onClick={close}>
              Cancel
            </Button>
            <Button type="submit" loading={invite.isPending}>
              Send invitation
            </Button>
          </Group>
        </Stack>
      </form>
    </Modal>
  );
}
