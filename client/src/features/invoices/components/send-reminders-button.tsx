import { Button } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconBellRinging } from '@tabler/icons-react';
import { useRunReminders, type ReminderRun } from '../api/run-reminders';

/** "Reminders: 2 sent, 1 skipped (a later stage was due), 0 stopped (paid or void)", plus what could not go. */
export function remindersWording(run: ReminderRun): string {
  const parts = [
    `${run.sent} sent`,
    `${run.skipped} skipped (a later stage was due)`,
    `${run.cancelled} stopped (paid or void)`,
  ];
  if (run.failed) parts.push(`${run.failed} could not be sent (no e-mail address, or the mail relay refused)`);
  return `Reminders: ${parts.join(', ')}`;
}

/**
 * Sends the overdue reminders due today now instead of at the scheduled hour. Running it twice sends nothing twice:
 * the server keeps one reminder per invoice and stage.
 */
export function SendRemindersButton() {
  const run = useRunReminders();
  return (
    <Button
      variant="default"
      leftSection={<IconBellRinging size={18} aria-hidden="true" />}
      loading={run.isPending}
      onClick={() =>
        run.mutate(undefined, {
          onSuccess: (result) =>
            notifications.show({ color: 'keenTeal', title: 'Due reminders', message: remindersWording(result) }),
        })
      }
    >
      Send due reminders
    </Button>
  );
}
