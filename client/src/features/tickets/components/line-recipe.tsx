import { Alert, Button, Collapse, Group, Stack, Text } from '@mantine/core';
import { useDisclosure } from '@mantine/hooks';
import { IconAlertTriangle, IconChevronDown, IconChevronUp } from '@tabler/icons-react';
import { edgeRecipe, isRuleError } from '@keenroute/shared';
import { useMemo } from 'react';
import { RecipeDetails } from '@/features/edge-recipes/components/recipe-details';
import type { TicketLine } from '../types';

// The bench cautions in a few words each, always in sight; the full sentences are in the recipe below.
const SHORT_CAUTIONS = [
  'Dust mask or extraction',
  'Watch the heat',
  'Fingers clear',
  'Follow the equipment maker’s instructions',
];

/** The shear's edge recipe, folded away, with the cautions always visible in short. */
export function LineRecipe({ line }: { line: TicketLine }) {
  const [opened, toggle] = useDisclosure(false);
  const insideEdge = line.addOns.includes('inside-edge-hone');
  const plan = useMemo(() => {
    try {
      return { recipe: edgeRecipe(line.shear, { insideEdge }), problem: null };
    } catch (error) {
      if (!isRuleError(error)) throw error;
      return { recipe: null, problem: error.message };
    }
  }, [line.shear, insideEdge]);
  const contentId = `recipe-${line.id}`;
  const minutes = line.recipe?.benchMinutes ?? plan.recipe?.benchMinutes;

  return (
    <Stack gap="xs">
      <Group gap={6} wrap="nowrap" align="flex-start" c="brass.9">
        <IconAlertTriangle size={18} aria-hidden="true" style={{ flexShrink: 0, marginTop: 2 }} />
        <Text size="sm" fw={600} aria-label="Cautions">
          {SHORT_CAUTIONS.join(' · ')}
        </Text>
      </Group>
      <Button
        variant="subtle"
        size="md"
        mih={44}
        justify="space-between"
        fullWidth
        rightSection={opened ? <IconChevronUp size={18} /> : <IconChevronDown size={18} />}
        aria-expanded={opened}
        aria-controls={contentId}
        onClick={toggle.toggle}
      >
        {opened ? 'Hide the edge recipe' : `Edge recipe${minutes ? `, ${minutes} min` : ''}`}
      </Button>
      <Collapse expanded={opened} id={contentId}>
        {plan.recipe ? <RecipeDetails recipe={plan.recipe} /> : null}
        {plan.problem ? (
          <Alert color="red" title="No recipe for this shear">
            {plan.problem}
          </Alert>
        ) : null}
      </Collapse>
    </Stack>
  );
}
