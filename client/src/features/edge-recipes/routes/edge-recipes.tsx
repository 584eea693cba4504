import { Stack, Text } from '@mantine/core';
import { useDisclosure, useMediaQuery } from '@mantine/hooks';
import { useMemo, useState } from 'react';
import { PageHeader } from '@/components/page-header';
import { EdgeRecipeDrawer } from '../components/edge-recipe-drawer';
import { RecipeCards } from '../components/recipe-cards';
import { RecipeControls } from '../components/recipe-controls';
import { RecipeTable } from '../components/recipe-table';
import { DEFAULT_RECIPE_SETTINGS, recipeRows, type RecipeRow } from '../recipe-settings';

export function EdgeRecipesRoute() {
  const [settings, setSettings] = useState(DEFAULT_RECIPE_SETTINGS);
  const [selectedKey, setSelectedKey] = useState<string | null>(null);
  const [opened, drawer] = useDisclosure(false);
  // Cards up to tablet width, as on the Team page: seven columns only fit beside the navbar from md.
  const showCards = useMediaQuery('(max-width: 62em)', false, { getInitialValueInEffect: false });
  const rows = useMemo(() => recipeRows(settings), [settings]);
  const shear = rows.find((row) => row.key === selectedKey)?.shear ?? null;

  const open = (row: RecipeRow) => {
    setSelectedKey(row.key);
    drawer.open();
  };

  return (
    <Stack gap="md" maw={1200}>
      <PageHeader
        title="Edge recipes"
        description="Keenroute's bench plan for every edge type and tool kind: the abrasive steps, the inside edge, the finish, the bench minutes and the cautions."
      />
      <Text size="sm" c="dimmed">
        The defaults are common practice at the bench, with no published source. Open a row for its full recipe.
      </Text>
      <RecipeControls settings={settings} onChange={setSettings} />
      {showCards ? <RecipeCards rows={rows} onOpen={open} /> : <RecipeTable rows={rows} onOpen={open} />}
      <EdgeRecipeDrawer shear={shear} insideEdge={settings.insideEdge} opened={opened} onClose={drawer.close} />
    </Stack>
  );
}
