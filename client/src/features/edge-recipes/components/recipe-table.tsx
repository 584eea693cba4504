import { Badge, Button, Table, Text, VisuallyHidden } from '@mantine/core';
import { EDGE_TYPE_LABELS, TOOL_KIND_LABELS } from '@keenroute/shared';
import { upperFirst } from '@/lib/format';
import { discsInBrief, finishInBrief, shearKind, type RecipeRow } from '../recipe-settings';

interface RecipeListProps {
  rows: readonly RecipeRow[];
  onOpen: (row: RecipeRow) => void;
}

export function RecipeTable({ rows, onOpen }: RecipeListProps) {
  return (
    <Table.ScrollContainer minWidth={860}>
      <Table verticalSpacing="sm" highlightOnHover striped="even" stripedColor="gray.0">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Edge type</Table.Th>
            <Table.Th>Tool kind</Table.Th>
            <Table.Th>Discs</Table.Th>
            <Table.Th>Finish</Table.Th>
            <Table.Th>Taken apart</Table.Th>
            <Table.Th ta="right">Bench minutes</Table.Th>
            <Table.Th>
              <VisuallyHidden>Recipe</VisuallyHidden>
            </Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rows.map((row) => (
            <Table.Tr key={row.key} onClick={() => onOpen(row)} style={{ cursor: 'pointer' }}>
              <Table.Td fw={600}>{upperFirst(EDGE_TYPE_LABELS[row.shear.edgeType])}</Table.Td>
              <Table.Td>{upperFirst(TOOL_KIND_LABELS[row.shear.toolKind])}</Table.Td>
              <Table.Td style={{ whiteSpace: 'nowrap' }}>{discsInBrief(row.recipe)}</Table.Td>
              <Table.Td>{upperFirst(finishInBrief(row.recipe))}</Table.Td>
              <Table.Td>
                {row.recipe.disassemble ? (
                  <Badge color="brass" variant="light" radius="sm">
                    Yes
                  </Badge>
                ) : (
                  <Text size="sm" c="dimmed">
                    No
                  </Text>
                )}
              </Table.Td>
              <Table.Td ta="right" fw={600}>
                {row.recipe.benchMinutes}
              </Table.Td>
              <Table.Td ta="right">
                <Button
                  variant="light"
                  size="sm"
                  aria-label={`Open recipe: ${shearKind(row.shear)}`}
                  onClick={(event) => {
                    // The row opens the same drawer; one click, one drawer.
                    event.stopPropagation();
                    onOpen(row);
                  }}
                >
                  Open recipe
                </Button>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

export type { RecipeListProps };
