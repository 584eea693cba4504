import { Badge, Button, Card, Group, Stack, Text } from '@mantine/core';
import { upperFirst } from '@/lib/format';
import { discsInBrief, finishInBrief, shearKind } from '../recipe-settings';
import type { RecipeListProps } from './recipe-table';

/** The phone's view: one card per edge type and tool kind, the recipe a thumb's reach away. */
export function RecipeCards({ rows, onOpen }: RecipeListProps) {
  return (
    <Stack gap="sm" component="ul" p={0} m={0} style={{ listStyle: 'none' }}>
      {rows.map((row) => (
        <Card key={row.key} component="li" withBorder padding="md" radius="md">
          <Text fw={700}>{upperFirst(shearKind(row.shear))}</Text>
          <Text size="sm" c="dimmed">
            {discsInBrief(row.recipe)}, then {finishInBrief(row.recipe)}
          </Text>
          <Group gap="xs" mt="xs">
            <Badge variant="light" radius="sm">
              {row.recipe.benchMinutes} bench minutes
            </Badge>
            {row.recipe.disassemble ? (
              <Badge variant="light" color="brass" radius="sm">
                Taken apart
              </Badge>
            ) : null}
          </Group>
          <Button
            variant="light"
            mt="sm"
            fullWidth
            aria-label={`Open recipe: ${shearKind(row.shear)}`}
            onClick={() => onOpen(row)}
          >
            Open recipe
          </Button>
        </Card>
      ))}
    </Stack>
  );
}
