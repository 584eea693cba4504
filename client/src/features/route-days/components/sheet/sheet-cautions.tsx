import { Card, List, Title } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';

/** The usual bench cautions, as the server words them (it defers to the equipment maker and local rules). */
export function SheetCautions({ cautions }: { cautions: string[] }) {
  if (cautions.length === 0) return null;
  return (
    <Card withBorder radius="lg" padding="md" component="section" aria-labelledby="sheet-cautions-title">
      <Title order={2} fz="h4" id="sheet-cautions-title" mb="xs">
        At the bench
      </Title>
      <List spacing="xs" icon={<IconAlertTriangle size={18} color="var(--mantine-color-brass-7)" aria-hidden="true" />}>
        {cautions.map((caution) => (
          <List.Item key={caution}>{caution}</List.Item>
        ))}
      </List>
    </Card>
  );
}
