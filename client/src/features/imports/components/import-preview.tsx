import { Alert, Button, Card, Group, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck } from '@tabler/icons-react';
import { countOf } from '../columns';
import type { ImportPreview as Preview, ImportRowError } from '../types';
import { RowErrorsTable } from './row-errors-table';
import { SampleTable } from './sample-table';

interface ImportPreviewProps {
  preview: Preview;
  /** The problems to show: the preview's, or those of a refused commit. */
  errors: ImportRowError[];
  /** Why a commit was refused, when it was. */
  refusal: string | null;
  committing: boolean;
  onCommit: () => void;
  onStartOver: () => void;
}

function Figure({ label, value, color }: { label: string; value: number; color?: string }) {
  return (
    <Stack gap={0}>
      <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
        {label}
      </Text>
      <Text fz="xl" fw={700} c={color}>
        {value.toLocaleString('en-US')}
      </Text>
    </Stack>
  );
}

export function ImportPreview({ preview, errors, refusal, committing, onCommit, onStartOver }: ImportPreviewProps) {
  const badRows = new Set(errors.map((error) => error.row)).size;
  const validCount = refusal ? preview.rowCount - badRows : preview.validCount;
  const canCommit = preview.canCommit && refusal === null && errors.length === 0;
  return (
    <Card withBorder radius="lg" padding="lg" component="section" aria-labelledby="import-preview-title">
      <Stack gap="md">
        <div>
          <Title order={2} fz="h4" id="import-preview-title">
            Preview of {preview.fileName}
          </Title>
          <Text size="sm" c="dimmed">
            Nothing is imported yet.
          </Text>
        </div>
        <SimpleGrid cols={3} spacing="sm">
          <Figure label="Rows" value={preview.rowCount} />
          <Figure label="Ready" value={validCount} color="keenTeal" />
          <Figure label="With problems" value={preview.rowCount - validCount} color={badRows > 0 ? 'red' : undefined} />
        </SimpleGrid>

        {refusal ? (
          <Alert color="red" icon={<IconAlertTriangle size={20} />} title="Nothing was imported">
            {refusal}
          </Alert>
        ) : null}

        {errors.length > 0 ? (
          <Stack gap="xs">
            <Title order={3} fz="h5">
              Problems to fix
            </Title>
            <Text size="sm">
              Fix these lines in the spreadsheet, save it as CSV again and drop it here. Line numbers count the header
              as line 1.
            </Text>
            <RowErrorsTable errors={errors} />
          </Stack>
        ) : (
          <Group gap="xs" c="keenTeal">
            <IconCircleCheck size={20} aria-hidden="true" />
            <Text size="sm">No problems found: every row is ready to import.</Text>
          </Group>
        )}

        <Stack gap="xs">
          <Title order={3} fz="h5">
            {preview.sample.length < preview.rowCount
              ? `The first ${preview.sample.length} rows`
              : `All ${preview.rowCount} rows`}
          </Title>
          <SampleTable kind={preview.kind} sample={preview.sample} />
        </Stack>

        <Group gap="sm">
          {canCommit ? (
            <Button size="md" loading={committing} onClick={onCommit}>
              Import {countOf(preview.kind, preview.rowCount)}
            </Button>
          ) : null}
          <Button size="md" variant="default" onClick={onStartOver} disabled={committing}>
            {canCommit ? 'Choose another file' : 'Start over'}
          </Button>
        </Group>
      </Stack>
    </Card>
  );
}
