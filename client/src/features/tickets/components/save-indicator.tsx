import { Button, Group, Loader, Text } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck } from '@tabler/icons-react';
import type { SaveState } from '../hooks/use-ticket-saver';

/** Always says where the ticket stands with the server: saving, saved, or not saved with a retry. */
export function SaveIndicator({ state, onRetry }: { state: SaveState; onRetry: () => void }) {
  if (state.status === 'error') {
    return (
      <Group gap="xs" wrap="nowrap" role="alert" c="red.8">
        <IconAlertTriangle size={20} aria-hidden="true" style={{ flexShrink: 0 }} />
        <Text size="sm" fw={600} style={{ minWidth: 0 }}>
          Not saved: {state.error?.message}
        </Text>
        <Button size="sm" color="red" variant="light" mih={44} onClick={onRetry} style={{ flexShrink: 0 }}>
          Retry
        </Button>
      </Group>
    );
  }
  return (
    <Group gap={6} wrap="nowrap" role="status" aria-live="polite" mih={44}>
      {state.status === 'saving' ? (
        <>
          <Loader size={16} aria-hidden="true" />
          <Text size="sm" fw={600}>
            Saving…
          </Text>
        </>
      ) : (
        <>
          <IconCircleCheck size={20} color="var(--mantine-color-keenTeal-6)" aria-hidden="true" />
          <Text size="sm" fw={600} c="keenTeal.7">
            {state.status === 'saved' ? 'Saved' : 'Up to date'}
          </Text>
        </>
      )}
    </Group>
  );
}
