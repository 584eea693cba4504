import { Table, Text } from '@mantine/core';
import { IMPORT_HELP } from '../columns';
import type { ImportKind } from '../types';

/** The first rows as the server read them, in the kind's column order, with their line numbers. */
export function SampleTable({ kind, sample }: { kind: ImportKind; sample: Record<string, string>[] }) {
  const present = new Set(sample.flatMap((row) => Object.keys(row)));
  const columns = IMPORT_HELP[kind].columns.map((column) => column.name).filter((name) => present.has(name));
  if (sample.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        No rows to show.
      </Text>
    );
  }
  return (
    <Table.ScrollContainer minWidth={Math.max(320, 64 + columns.length * 130)}>
      <Table verticalSpacing={4} horizontalSpacing="xs" fz="sm" striped aria-label="The first rows of the file">
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={56}>Line</Table.Th>
            {columns.map((column) => (
              <Table.Th key={column}>{column}</Table.Th>
            ))}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {sample.map((row, index) => (
            <Table.Tr key={index}>
              <Table.Td>{index + 2}</Table.Td>
              {columns.map((column) => (
                <Table.Td key={column}>{row[column]}</Table.Td>
              ))}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
