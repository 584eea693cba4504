import { Button, Code, Group, Paper, Stack, Text, ThemeIcon } from '@mantine/core';
import { IconCircleCheck } from '@tabler/icons-react';
import { describeShear } from '@keenroute/shared';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import type { ShearDetail } from '../types';

/** After registering: the new tag code, big enough to copy onto the shear's tag without squinting. */
export function ShearRegistered({
  shear,
  onDone,
  onAnother,
}: {
  shear: ShearDetail;
  onDone: () => void;
  onAnother: () => void;
}) {
  return (
    <Stack gap="md" align="stretch">
      <Group gap="sm" wrap="nowrap">
        <ThemeIcon color="keenTeal" variant="light" size="lg" radius="xl">
          <IconCircleCheck size={22} aria-hidden="true" />
        </ThemeIcon>
        <Text fw={600}>Shear registered for {shear.customer.name}</Text>
      </Group>
      <Paper withBorder radius="md" p="lg" ta="center" bg="var(--mantine-color-keenTeal-0)">
        <Text size="sm" c="dimmed">
          Its tag code
        </Text>
        <Code
          block={false}
          aria-label="New tag code"
          fz={{ base: 32, sm: 40 }}
          fw={700}
          bg="transparent"
          style={{ letterSpacing: '0.06em' }}
        >
          {shear.tagCode}
        </Code>
        <Text size="sm" mt="xs">
          {describeShear(shear)}
        </Text>
      </Paper>
      <Text size="sm" c="dimmed">
        Put this code on the shear&apos;s tag; anyone can find the shear by it. You can print the label from the
        shear&apos;s page.
      </Text>
      <Group justify="flex-end" gap="sm">
        <Button variant="default" onClick={onAnother}>
          Register another
        </Button>
        <Button component={Link} to={paths.shears.detail.getHref(shear.id)} variant="light" onClick={onDone}>
          Open the shear
        </Button>
        <Button onClick={onDone}>Done</Button>
      </Group>
    </Stack>
  );
}
