import { Badge, Group, Paper, Stack, Text } from '@mantine/core';
import { BLADE_SCOPE_LABELS, type RecipeStep } from '@keenroute/shared';
import { SPEED_LABELS, stepName } from '../recipe-settings';

function Detail({ label, children }: { label: string; children: string }) {
  return (
    <Text size="sm">
      <Text span fw={600}>
        {label}:
      </Text>{' '}
      {children}
    </Text>
  );
}

/** The abrasive steps in order, coarse to fine, each with what to look for before moving on. */
export function RecipeSteps({ steps }: { steps: readonly RecipeStep[] }) {
  return (
    <Stack component="ol" gap="sm" p={0} m={0} style={{ listStyle: 'none' }} aria-label="Steps, coarse to fine">
      {steps.map((step) => (
        <Paper key={step.order} component="li" withBorder radius="md" p="sm">
          <Group justify="space-between" align="flex-start" gap="xs" mb={6}>
            <Text fw={700}>
              {step.order}. {stepName(step)}
            </Text>
            <Badge variant="light" color={step.surface === 'paste-pad' ? 'brass' : 'keenTeal'} radius="sm">
              {SPEED_LABELS[step.speed]}
            </Badge>
          </Group>
          <Stack gap={4}>
            <Text size="sm" c="dimmed">
              Nearest grades: {step.fepaP ? `FEPA ${step.fepaP}` : 'no FEPA P grade this size'} ·{' '}
              {step.jis ? `JIS ${step.jis}` : 'no JIS grade this size'}
            </Text>
            <Detail label="Speed">{step.speedNote}</Detail>
            <Detail label="Look for">{step.lookFor}</Detail>
            <Detail label="Blades">{BLADE_SCOPE_LABELS[step.blades]}</Detail>
          </Stack>
        </Paper>
      ))}
    </Stack>
  );
}
