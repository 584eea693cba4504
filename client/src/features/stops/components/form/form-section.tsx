import { Card, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';

/** One titled part of the stop form. */
export function FormSection({
  title,
  description,
  children,
}: {
  title: string;
  description?: string;
  children: ReactNode;
}) {
  const id = `stop-form-${title.toLowerCase().replace(/\W+/g, '-')}`;
  return (
    <Card withBorder radius="lg" p={{ base: 'sm', sm: 'md' }} component="section" aria-labelledby={id}>
      <Stack gap="md">
        <div>
          <Title order={2} fz="h4" id={id}>
            {title}
          </Title>
          {description ? (
            <Text size="sm" c="dimmed">
              {description}
            </Text>
          ) : null}
        </div>
        {children}
      </Stack>
    </Card>
  );
}
