import { Card, Group, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';

interface ReportSectionProps {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
}

/** One chart or table of a report, with its title and its CSV button. */
export function ReportSection({ title, description, actions, children }: ReportSectionProps) {
  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-label={title}>
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" gap="sm">
          <Stack gap={2} style={{ flex: '1 1 14rem' }}>
            <Title order={2} fz="h4">
              {title}
            </Title>
            {description ? (
              <Text size="sm" c="dimmed">
                {description}
              </Text>
            ) : null}
          </Stack>
          {actions ? <Group gap="xs">{actions}</Group> : null}
        </Group>
        {children}
      </Stack>
    </Card>
  );
}
