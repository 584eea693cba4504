import { Button, Card, Stack, Text } from '@mantine/core';
import { IconChecks, IconFlag, IconHandStop } from '@tabler/icons-react';
import { useState } from 'react';
import type { TicketChange } from '../api/change-ticket';
import { useTicketScreen } from './ticket-context';

/** Why the ticket cannot be finished yet, in words; null when it can. */
export function finishBlocker(lines: { benchStatus: string }[]): string | null {
  if (lines.length === 0) return 'Add a shear first.';
  const notReady = lines.filter((line) => line.benchStatus !== 'ready' && line.benchStatus !== 'handed-back').length;
  if (notReady === 0) return null;
  return notReady === 1 ? '1 shear is not ready yet.' : `${notReady} shears are not ready yet.`;
}

/** Mark all ready, finish, hand back: the ticket's steps in order, each saying why it waits. */
export function TicketActions() {
  const { ticket, saver } = useTicketScreen();
  const [working, setWorking] = useState<string | null>(null);

  const run = async (name: string, changes: TicketChange[]) => {
    setWorking(name);
    for (const change of changes) {
      const outcome = await saver.save(change);
      if (!outcome.ok) break;
    }
    setWorking(null);
  };

  if (ticket.status === 'open') {
    const waiting = ticket.lines.filter(
      (line) => line.benchStatus === 'waiting' || line.benchStatus === 'on-the-bench',
    );
    const blocker = finishBlocker(ticket.lines);
    return (
      <Card withBorder radius="lg" padding="md">
        <Stack gap="sm">
          {waiting.length > 0 ? (
            <Button
              variant="light"
              size="lg"
              leftSection={<IconChecks size={22} />}
              loading={working === 'ready'}
              onClick={() =>
                void run(
                  'ready',
                  waiting.map((line) => ({
                    kind: 'change-line',
                    lineId: line.id,
                    changes: { benchStatus: 'ready' },
                  })),
                )
              }
            >
              Mark all ready
            </Button>
          ) : null}
          <Button
            size="lg"
            leftSection={<IconFlag size={22} />}
            disabled={blocker !== null}
            loading={working === 'finish'}
            aria-describedby={blocker ? 'finish-blocker' : undefined}
            onClick={() => void run('finish', [{ kind: 'finish' }])}
          >
            Finish ticket
          </Button>
          {blocker ? (
            <Text id="finish-blocker" size="sm" c="dimmed">
              {blocker}
            </Text>
          ) : (
            <Text size="sm" c="dimmed">
              Finishing adds a service history row to each shear.
            </Text>
          )}
        </Stack>
      </Card>
    );
  }
  if (ticket.status === 'finished') {
    return (
      <Card withBorder radius="lg" padding="md">
        <Stack gap="sm">
          <Text fw={600}>All shears are done. Hand them back to {ticket.customer.name}.</Text>
          <Button
            size="lg"
            leftSection={<IconHandStop size={22} />}
            loading={working === 'hand-back'}
            onClick={() => void run('hand-back', [{ kind: 'hand-back' }])}
          >
            Hand back
          </Button>
        </Stack>
      </Card>
    );
  }
  return null;
}
