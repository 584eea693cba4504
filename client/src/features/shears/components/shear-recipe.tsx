import { Alert, Card, Stack, Switch, Title } from '@mantine/core';
import { edgeRecipe, isRuleError } from '@keenroute/shared';
import { useMemo, useState } from 'react';
import { RecipeDetails } from '@/features/edge-recipes/components/recipe-details';
import type { ShearSummary } from '../types';

/** The bench plan for this very shear, from the default recipe table, cautions first. */
export function ShearRecipe({ shear }: { shear: ShearSummary }) {
  const [insideEdge, setInsideEdge] = useState(false);
  const plan = useMemo(() => {
    try {
      return { recipe: edgeRecipe(shear, { insideEdge }), problem: null };
    } catch (error) {
      if (!isRuleError(error)) throw error;
      return { recipe: null, problem: error.message };
    }
  }, [shear, insideEdge]);

  return (
    <Card withBorder radius="lg" padding="lg" component="section" aria-labelledby="shear-recipe-title">
      <Stack gap="md">
        <Title order={2} fz="h3" id="shear-recipe-title">
          Edge recipe
        </Title>
        <Switch
          label="Inside-edge work"
          description="Convex and semi-convex shears are then taken apart and the inside edge honed."
          checked={insideEdge}
          onChange={(event) => setInsideEdge(event.currentTarget.checked)}
          size="md"
        />
        {plan.recipe ? <RecipeDetails recipe={plan.recipe} /> : null}
        {plan.problem ? (
          <Alert color="red" title="No recipe for this shear">
            {plan.problem}
          </Alert>
        ) : null}
      </Stack>
    </Card>
  );
}
