import { Alert, Button, Group, Stack, Text } from '@mantine/core';
import { IconCircleCheck } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { countOf, IMPORT_HELP } from '../columns';
import type { ImportKind, ImportResult } from '../types';

const LIST_HREF: Readonly<Record<ImportKind, string>> = {
  stops: paths.stops.list.getHref(),
  customers: paths.customers.list.getHref(),
  shears: paths.shears.list.getHref(),
};

export function ImportDone({
  result,
  fileName,
  onAnother,
}: {
  result: ImportResult;
  fileName: string;
  onAnother: () => void;
}) {
  return (
    <Alert color="keenTeal" radius="lg" icon={<IconCircleCheck size={22} />} title="Import finished">
      <Stack gap="sm" align="flex-start">
        <Text size="sm">
          {countOf(result.kind, result.created)} imported from {fileName}.
          {result.kind === 'shears' ? ' Each has a new tag code; print their labels from the Shears list.' : ''}
        </Text>
        <Group gap="sm">
          <Button component={Link} to={LIST_HREF[result.kind]}>
            Open the {IMPORT_HELP[result.kind].label} list
          </Button>
          <Button variant="default" onClick={onAnother}>
            Import another file
          </Button>
        </Group>
      </Stack>
    </Alert>
  );
}
