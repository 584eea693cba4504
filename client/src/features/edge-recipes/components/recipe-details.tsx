import { Badge, Group, List, Stack, Text, Title } from '@mantine/core';
import type { EdgeRecipe, InsideEdgePlan } from '@keenroute/shared';
import type { ReactNode } from 'react';
import { RecipeCautions } from './recipe-cautions';
import { RecipeSteps } from './recipe-steps';

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Stack gap="xs" component="section">
      <Title order={3} fz="h4">
        {title}
      </Title>
      {children}
    </Stack>
  );
}

function insideEdgeText(plan: InsideEdgePlan): string {
  const size = plan.approxUm === null ? '' : `, about ${plan.approxUm} µm`;
  return `Taken apart. The inside edge is re-established on a ${plan.stone}, ${plan.jis} (JIS R6001${size}), with ${plan.lubricant}.`;
}

/** Everything the bench needs to know about one shear's recipe, cautions first. */
export function RecipeDetails({ recipe }: { recipe: EdgeRecipe }) {
  const edited = recipe.source === 'edited';
  return (
    <Stack gap="lg">
      <RecipeCautions cautions={recipe.cautions} />

      <Group gap="xs">
        <Badge variant={edited ? 'filled' : 'light'} color={edited ? 'brass' : 'gray'} radius="sm">
          {edited ? 'Edited by the owner' : 'Common practice default'}
        </Badge>
        <Badge variant="light" radius="sm">
          {recipe.benchMinutes} bench minutes
        </Badge>
        <Badge variant="light" color={recipe.disassemble ? 'brass' : 'gray'} radius="sm">
          {recipe.disassemble ? 'Taken apart' : 'Not taken apart'}
        </Badge>
      </Group>

      <Section title="Steps, coarse to fine">
        <RecipeSteps steps={recipe.steps} />
      </Section>

      <Section title="Taking apart and the inside edge">
        {recipe.insideEdge ? (
          <>
            <Text size="sm">{insideEdgeText(recipe.insideEdge)}</Text>
            <Text size="sm">{recipe.insideEdge.note}</Text>
          </>
        ) : (
          <Text size="sm">Not taken apart: this recipe does no inside-edge work.</Text>
        )}
      </Section>

      <Section title="Finish">
        <Text size="sm">{recipe.finish.description}</Text>
      </Section>

      <Section title="Bench time">
        <Text size="sm">{recipe.benchMinutes} minutes for this pair, not counting the setup at the stop.</Text>
      </Section>

      {recipe.notes.length > 0 ? (
        <Section title="Notes">
          <List size="sm" spacing={4}>
            {recipe.notes.map((note) => (
              <List.Item key={note}>{note}</List.Item>
            ))}
          </List>
        </Section>
      ) : null}

      <Text size="xs" c="dimmed">
        {edited
          ? 'This recipe was edited by the owner; the cautions always stay.'
          : "Keenroute's default recipe: common practice at the bench, with no published source."}
      </Text>
    </Stack>
  );
}
