import { Alert, List, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';

/** The recipe's cautions, first and impossible to miss: heat, dust and blades can hurt someone. */
export function RecipeCautions({ cautions }: { cautions: readonly string[] }) {
  return (
    <Alert
      color="brass"
      variant="light"
      radius="md"
      title="Cautions at the bench"
      icon={<IconAlertTriangle size={22} aria-hidden="true" />}
      styles={{
        root: { borderLeft: '5px solid var(--mantine-color-brass-6)' },
        title: { fontSize: 'var(--mantine-font-size-md)' },
      }}
    >
      <List size="sm" spacing={6}>
        {cautions.map((caution) => (
          <List.Item key={caution}>{caution}</List.Item>
        ))}
      </List>
      <Text size="sm" fw={600} mt="sm">
        Keenroute defers to the equipment maker&apos;s instructions and your local workplace-safety rules: where they
        say otherwise, follow them.
      </Text>
    </Alert>
  );
}
