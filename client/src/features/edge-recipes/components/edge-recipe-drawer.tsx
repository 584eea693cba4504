import { Alert, Drawer } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import { describeShear, edgeRecipe, isRuleError, type EdgeRecipeOptions, type Shear } from '@keenroute/shared';
import { useMemo } from 'react';
import { RecipeDetails } from './recipe-details';

export interface EdgeRecipeDrawerProps {
  /** The shear whose recipe is shown; null while none is chosen. */
  shear: Shear | null;
  opened: boolean;
  onClose: () => void;
  /** The shear needs inside-edge work. */
  insideEdge?: boolean;
  /** The owner's edits to the recipe table and bench minutes, when there are any. */
  options?: Omit<EdgeRecipeOptions, 'insideEdge'>;
}

/** One shear's edge recipe in a side drawer; any screen with a shear row can open it. */
export function EdgeRecipeDrawer({ shear, opened, onClose, insideEdge = false, options }: EdgeRecipeDrawerProps) {
  const phone = useMediaQuery('(max-width: 48em)', false, { getInitialValueInEffect: false });
  const plan = useMemo(() => {
    if (!shear) return null;
    try {
      return { recipe: edgeRecipe(shear, { ...options, insideEdge }), problem: null };
    } catch (error) {
      if (!isRuleError(error)) throw error;
      return { recipe: null, problem: error.message };
    }
  }, [shear, insideEdge, options]);

  return (
    <Drawer
      opened={opened}
      onClose={onClose}
      position="right"
      size={phone ? '100%' : 'xl'}
      title={shear ? `Edge recipe: ${describeShear(shear)}` : 'Edge recipe'}
      styles={{ title: { fontWeight: 700, fontSize: 'var(--mantine-font-size-lg)' } }}
      closeButtonProps={{ 'aria-label': 'Close the recipe' }}
    >
      {plan?.recipe ? <RecipeDetails recipe={plan.recipe} /> : null}
      {plan?.problem ? (
        <Alert color="red" title="No recipe for this shear">
          {plan.problem}
        </Alert>
      ) : null}
    </Drawer>
  );
}
