import { Button, Code, Table, Text } from '@mantine/core';
import { useState } from 'react';
import type { ImportRowError } from '../types';

/** Problems listed before "Show all": enough to see what is wrong without a page of scrolling. */
const FIRST_SHOWN = 50;

/** The file's problems by line: row 1 is the first line under the header, so it is line 2 of the file. */
export function RowErrorsTable({ errors }: { errors: ImportRowError[] }) {
  const [showAll, setShowAll] = useState(false);
  const shown = showAll ? errors : errors.slice(0, FIRST_SHOWN);
  return (
    <>
      <Table.ScrollContainer minWidth={320}>
        <Table verticalSpacing={6} horizontalSpacing="xs" fz="sm" striped aria-label="Problems by line">
          <Table.Thead>
            <Table.Tr>
              <Table.Th w={64}>Line</Table.Th>
              <Table.Th w={120}>Column</Table.Th>
              <Table.Th>Problem</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {shown.map((error, index) => (
              <Table.Tr key={`${error.row}-${error.column ?? ''}-${index}`}>
                <Table.Td>{error.row + 1}</Table.Td>
                <Table.Td>
                  {error.column ? <Code style={{ wordBreak: 'break-all' }}>{error.column}</Code> : 'whole row'}
                </Table.Td>
                <Table.Td>{error.message}</Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      {errors.length > shown.length ? (
        <Text size="sm">
          {errors.length - shown.length} more.{' '}
          <Button variant="subtle" size="compact-sm" onClick={() => setShowAll(true)}>
            Show all {errors.length}
          </Button>
        </Text>
      ) : null}
    </>
  );
}
