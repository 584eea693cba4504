import { Button, Group, Kbd, Paper, Text } from '@mantine/core';
import { IconArrowRight } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { makeAndModel } from '../labels';
import type { ShearSummary } from '../types';

/** When the search is a tag code and that shear is found, one click (or Enter) opens it. */
export function TagShortcut({ shear }: { shear: ShearSummary }) {
  return (
    <Paper withBorder radius="md" p="sm" bg="var(--mantine-color-keenTeal-0)">
      <Group justify="space-between" gap="sm" wrap="wrap">
        <Text size="sm">
          {makeAndModel(shear)}, {shear.customer.name}.{' '}
          <Text span c="dimmed" size="sm" visibleFrom="sm">
            Press <Kbd size="xs">Enter</Kbd> to open it.
          </Text>
        </Text>
        <Button
          component={Link}
          to={paths.shears.detail.getHref(shear.id)}
          rightSection={<IconArrowRight size={18} />}
          ff="monospace"
        >
          Go to {shear.tagCode}
        </Button>
      </Group>
    </Paper>
  );
}
