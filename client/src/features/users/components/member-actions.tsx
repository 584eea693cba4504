import { ActionIcon, Menu } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { notifications } from '@mantine/notifications';
import { IconDots, IconMailForward, IconUserCheck, IconUserCog, IconUserOff } from '@tabler/icons-react';
import type { SessionUser } from '@/lib/session';
import { useResendInvitation } from '../api/resend-invitation';
import { useUpdateUser } from '../api/update-user';
import { canManageMember } from '../can-manage';
import type { TeamMember } from '../types';
import { ChangeRoleModal } from './change-role-modal';
import { DeactivateModal } from './deactivate-modal';

export function MemberActions({ member, actor }: { member: TeamMember; actor: SessionUser }) {
  const [roleOpened, roleModal] = useDisclosure(false);
  const [deactivateOpened, deactivateModal] = useDisclosure(false);
  const update = useUpdateUser();
  const resend = useResendInvitation();

  if (!canManageMember(actor, member)) return null;

  const reactivate = () =>
    update.mutate(
      { id: member.id, changes: { active: true } },
      {
        onSuccess: (saved) =>
          notifications.show({ color: 'keenTeal', title: 'Reactivated', message: `${saved.name} can sign in again.` }),
      },
    );

  const resendInvitation = () =>
    resend.mutate(member.id, {
      onSuccess: () =>
        notifications.show({
          color: 'keenTeal',
          title: 'Invitation sent again',
          message: `A new link is on its way to ${member.email}; the old one no longer works.`,
        }),
    });

  return (
    <>
      <Menu position="bottom-end" withinPortal shadow="md">
        <Menu.Target>
          <ActionIcon
            aria-label={`Actions for ${member.name}`}
            color="gray"
            loading={update.isPending || resend.isPending}
          >
            <IconDots size={20} />
          </ActionIcon>
        </Menu.Target>
        <Menu.Dropdown>
          <Menu.Item leftSection={<IconUserCog size={18} />} onClick={roleModal.open}>
            Change role
          </Menu.Item>
          {member.status === 'invited' ? (
            <Menu.Item leftSection={<IconMailForward size={18} />} onClick={resendInvitation}>
              Resend invitation
            </Menu.Item>
          ) : null}
          {member.status === 'deactivated' ? (
            <Menu.Item leftSection={<IconUserCheck size={18} />} onClick={reactivate}>
              Reactivate
            </Menu.Item>
          ) : (
            <Menu.Item leftSection={<IconUserOff size={18} />} color="red" onClick={deactivateModal.open}>
              Deactivate
            </Menu.Item>
          )}
        </Menu.Dropdown>
      </Menu>
      {roleOpened ? <ChangeRoleModal member={member} actorRole={actor.role} opened onClose={roleModal.close} /> : null}
      {deactivateOpened ? <DeactivateModal member={member} opened onClose={deactivateModal.close} /> : null}
    </>
  );
}
