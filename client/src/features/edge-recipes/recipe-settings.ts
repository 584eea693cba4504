import {
  EDGE_TYPE_LABELS,
  EDGE_TYPES,
  TOOL_KIND_LABELS,
  TOOL_KINDS,
  edgeRecipe,
  type AbrasiveSpeed,
  type EdgeRecipe,
  type Handedness,
  type RecipeStep,
  type Shear,
  type ShearUse,
} from '@keenroute/shared';

/** What the Edge recipes page asks about the shears it lists. */
export interface RecipeSettings {
  lengthIn: number;
  handedness: Handedness;
  use: ShearUse;
  /** The shears need inside-edge work (convex and semi-convex are then taken apart). */
  insideEdge: boolean;
}

export const DEFAULT_RECIPE_SETTINGS: RecipeSettings = {
  lengthIn: 6.5,
  handedness: 'right',
  use: 'hair',
  insideEdge: false,
};

export interface RecipeRow {
  key: string;
  shear: Shear;
  recipe: EdgeRecipe;
}

/** One row per edge type and tool kind, each with its recipe from the shared rules. */
export function recipeRows(settings: RecipeSettings): RecipeRow[] {
  return EDGE_TYPES.flatMap((edgeType) =>
    TOOL_KINDS.map((toolKind) => {
      const shear: Shear = {
        edgeType,
        toolKind,
        lengthIn: settings.lengthIn,
        handedness: settings.handedness,
        use: settings.use,
      };
      return { key: `${edgeType}/${toolKind}`, shear, recipe: edgeRecipe(shear, { insideEdge: settings.insideEdge }) };
    }),
  );
}

/** "convex straight shear": the kind of shear, without its length or hand. */
export function shearKind(shear: Pick<Shear, 'edgeType' | 'toolKind'>): string {
  return `${EDGE_TYPE_LABELS[shear.edgeType]} ${TOOL_KIND_LABELS[shear.toolKind]}`;
}

export const SPEED_LABELS: Readonly<Record<AbrasiveSpeed, string>> = {
  low: 'Low speed',
  medium: 'Medium speed',
  high: 'High speed',
  highest: 'Highest speed',
};

export function stepName(step: RecipeStep): string {
  if (step.surface === 'disc') return `${step.gradeUm} µm disc`;
  const range = step.gradeRangeUm;
  return range
    ? `Diamond-paste felt pad, ${range.minUm}–${range.maxUm} µm`
    : `Diamond-paste felt pad, ${step.gradeUm} µm`;
}

/** "80 → 60 → 30 → 15 → 9 µm": the discs in order, for a table cell. */
export function discsInBrief(recipe: EdgeRecipe): string {
  const discs = recipe.steps.filter((step) => step.surface === 'disc').map((step) => step.gradeUm);
  return discs.length > 0 ? `${discs.join(' → ')} µm` : 'no discs';
}

/** "paste pad 3–7 µm, wipe" or "9 µm disc, wipe". */
export function finishInBrief(recipe: EdgeRecipe): string {
  const pad = recipe.steps.find((step) => step.surface === 'paste-pad');
  const finish = pad?.gradeRangeUm
    ? `paste pad ${pad.gradeRangeUm.minUm}–${pad.gradeRangeUm.maxUm} µm`
    : `${recipe.finish.gradeUm} µm disc`;
  return recipe.finish.wipe ? `${finish}, wipe` : finish;
}
