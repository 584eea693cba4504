import { Card, Group, Title } from '@mantine/core';
import type { ReactNode } from 'react';

/** One card of the stop page: a title, its actions, and what it shows. */
export function DetailCard({ title, actions, children }: { title: string; actions?: ReactNode; children: ReactNode }) {
  const id = `stop-card-${title.toLowerCase().replace(/\W+/g, '-')}`;
  return (
    <Card withBorder radius="lg" p={{ base: 'sm', sm: 'md' }} component="section" aria-labelledby={id}>
      <Group justify="space-between" align="center" gap="sm" mb="sm">
        <Title order={2} fz="h4" id={id}>
          {title}
        </Title>
        {actions ? <Group gap="xs">{actions}</Group> : null}
      </Group>
      {children}
    </Card>
  );
}
