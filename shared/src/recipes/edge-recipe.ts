import { pairBenchMinutes } from '../bench-time.js';
import { findGrade, formatGrade, nearestGrade } from '../grit-scales.js';
import { EDGE_TYPE_LABELS, validateShear, type Shear } from '../shears.js';
import { BENCH_CAUTIONS } from './cautions.js';
import { DEFAULT_RECIPE_TABLE } from './default-table.js';
import { resolveRecipeTable } from './edit-table.js';
import type {
  EdgeRecipe,
  EdgeRecipeOptions,
  InsideEdgePlan,
  InsideEdgeRule,
  RecipeFinish,
  RecipeStep,
} from './types.js';

function displayGrades(gradeUm: number): { fepaP: string | null; jis: string | null } {
  return {
    fepaP: nearestGrade('fepa-p', gradeUm)?.label ?? null,
    jis: nearestGrade('jis', gradeUm)?.label ?? null,
  };
}

function insideEdgePlan(rule: InsideEdgeRule): InsideEdgePlan {
  return { ...rule, jis: formatGrade('jis', rule.jisGrit), approxUm: findGrade('jis', rule.jisGrit)?.um ?? null };
}

/**
 * The ordered bench plan for one shear: abrasive steps, taking apart and inside edge, finish, bench minutes and the
 * cautions. Throws a RuleError when the shear or an edited table is not valid.
 */
export function edgeRecipe(input: Shear, options: EdgeRecipeOptions = {}): EdgeRecipe {
  const shear = validateShear(input);
  const use = shear.use ?? 'hair';
  const table = options.table ? resolveRecipeTable(options.table) : DEFAULT_RECIPE_TABLE;
  const entry = table[shear.edgeType][shear.toolKind];
  const notes = [...entry.notes];

  const steps: RecipeStep[] = entry.discs.map((disc, index) => ({
    order: index + 1,
    surface: 'disc',
    gradeUm: disc.gradeUm,
    gradeRangeUm: null,
    ...displayGrades(disc.gradeUm),
    speed: disc.speed,
    speedNote: disc.speedNote,
    lookFor: disc.lookFor,
    blades: entry.blades,
  }));
  const lastDiscUm = steps[steps.length - 1]?.gradeUm ?? 0;

  const finishRule = entry.finish[use];
  let finish: RecipeFinish;
  if (finishRule.kind === 'paste-pad') {
    const padUm = (finishRule.minUm + finishRule.maxUm) / 2;
    steps.push({
      order: steps.length + 1,
      surface: 'paste-pad',
      gradeUm: padUm,
      gradeRangeUm: { minUm: finishRule.minUm, maxUm: finishRule.maxUm },
      ...displayGrades(padUm),
      speed: finishRule.speed,
      speedNote: 'Highest speed.',
      lookFor: finishRule.lookFor,
      blades: entry.blades,
    });
    finish = {
      kind: 'paste-pad',
      gradeUm: padUm,
      wipe: entry.wipe,
      description: `Diamond-paste felt pad rated ${finishRule.minUm}–${finishRule.maxUm} µm${entry.wipe ? ', then a wipe' : ''}.`,
    };
  } else {
    finish = {
      kind: 'last-disc',
      gradeUm: lastDiscUm,
      wipe: entry.wipe,
      description: `Finished at the ${lastDiscUm} µm disc${entry.wipe ? ', then a wipe' : ''}.`,
    };
  }

  let insideEdge: InsideEdgePlan | null = null;
  if (options.insideEdge && entry.insideEdge) {
    insideEdge = insideEdgePlan(entry.insideEdge);
  } else if (options.insideEdge) {
    notes.push(
      `Inside-edge work was asked for, but the ${EDGE_TYPE_LABELS[shear.edgeType]} recipe has none; check with the shear's maker.`,
    );
  }

  return {
    shear: { ...shear, use },
    steps,
    disassemble: insideEdge !== null,
    insideEdge,
    finish,
    benchMinutes: pairBenchMinutes(
      { edgeType: shear.edgeType, toolKind: shear.toolKind, insideEdge: insideEdge !== null },
      options.bench,
    ),
    cautions: [...BENCH_CAUTIONS, ...entry.cautions],
    notes,
    source: options.table?.[shear.edgeType]?.[shear.toolKind] ? 'edited' : 'common practice',
  };
}
