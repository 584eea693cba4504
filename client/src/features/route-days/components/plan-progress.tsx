import { Group, Loader, Paper, Progress, Stack, Text } from '@mantine/core';
import { useEffect, useState } from 'react';

// The solver's time limit is a setting; until it is known, the usual few seconds.
const USUAL_SECONDS = 5;

/** While the planner works: elapsed seconds, a bar that fills over the expected time, and what it is doing. */
export function PlanProgress({ expectedSeconds }: { expectedSeconds?: number }) {
  const [startedAt] = useState(() => Date.now());
  const [elapsedMs, setElapsedMs] = useState(0);
  useEffect(() => {
    const timer = window.setInterval(() => setElapsedMs(Date.now() - startedAt), 250);
    return () => window.clearInterval(timer);
  }, [startedAt]);

  const expectedMs = (expectedSeconds && expectedSeconds > 0 ? expectedSeconds : USUAL_SECONDS) * 1000;
  // Never shows full: the bar waits for the answer, not for the clock.
  const value = Math.min(95, (elapsedMs / expectedMs) * 100);
  const seconds = Math.floor(elapsedMs / 1000);

  return (
    <Paper withBorder radius="md" p="md" role="status" aria-live="polite" bg="keenTeal.0">
      <Stack gap="xs">
        <Group gap="sm">
          <Loader size="sm" />
          <Text fw={600}>Planning the week… {seconds} s</Text>
        </Group>
        <Progress value={value} animated striped color="keenTeal" aria-label="Planning progress" />
        <Text size="sm" c="dimmed">
          Keenroute is trying orders of stops against opening hours, lunch and the latest finish. Locked stops stay
          where they are.
        </Text>
      </Stack>
    </Paper>
  );
}
