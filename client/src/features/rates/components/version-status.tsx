import { Alert, Badge, Group, Text } from '@mantine/core';
import { IconInfoCircle } from '@tabler/icons-react';
import { formatDateTime } from '@/lib/format';
import type { RateCardVersion } from '../types';

/** Which version is in force and when it was saved; before any save, that the card is the invented demo card. */
export function VersionStatus({ current }: { current: RateCardVersion }) {
  if (current.version === null) {
    return (
      <Alert color="brass" icon={<IconInfoCircle size={20} aria-hidden="true" />} title="Nothing saved yet">
        These are the invented demo rates, a starting point and not real prices. Change what you need and save to put
        your own card in force; until then the server has no card to quote from.
      </Alert>
    );
  }
  return (
    <Group gap="sm" data-testid="rate-card-version">
      <Badge size="lg" radius="sm" variant="light">
        Version {current.version}
      </Badge>
      <Text size="sm" c="dimmed">
        {current.savedAt ? `Saved ${formatDateTime(current.savedAt)}` : null}
      </Text>
    </Group>
  );
}
