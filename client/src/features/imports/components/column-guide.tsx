import { Badge, Button, Card, Code, Group, Stack, Table, Text, Title } from '@mantine/core';
import { IconDownload } from '@tabler/icons-react';
import { useDownloadTemplate } from '../api/get-import-template';
import { IMPORT_HELP } from '../columns';
import type { ImportKind } from '../types';

/** The file's columns in words, and the template to start from. */
export function ColumnGuide({ kind }: { kind: ImportKind }) {
  const help = IMPORT_HELP[kind];
  const download = useDownloadTemplate();
  return (
    <Card withBorder radius="lg" padding="lg" component="section" aria-labelledby="column-guide-title">
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" gap="sm">
          <Title order={2} fz="h4" id="column-guide-title">
            {help.label} file columns
          </Title>
          <Button
            variant="light"
            leftSection={<IconDownload size={18} aria-hidden="true" />}
            loading={download.isPending}
            onClick={() => download.mutate(kind)}
          >
            Download the template
          </Button>
        </Group>
        <Text size="sm">{help.summary}</Text>
        <Text size="sm" c="dimmed">
          The first row names the columns (in any order; only the required ones must be there). Save the sheet as CSV
          UTF-8; a file holds up to 5 MB.
        </Text>
        <Table verticalSpacing={6} horizontalSpacing="xs" fz="sm">
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Column</Table.Th>
              <Table.Th>What it holds</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {help.columns.map((column) => (
              <Table.Tr key={column.name}>
                <Table.Td style={{ verticalAlign: 'top' }}>
                  <Code style={{ wordBreak: 'break-all' }}>{column.name}</Code>
                  {column.required ? (
                    <Badge size="xs" radius="sm" variant="light" color="brass" ml={4}>
                      required
                    </Badge>
                  ) : null}
                </Table.Td>
                <Table.Td>{column.help}</Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      </Stack>
    </Card>
  );
}
