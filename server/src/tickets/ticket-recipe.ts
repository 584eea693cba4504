import { BLADE_SCOPE_LABELS, edgeRecipe, isRuleError, type AddOnCode, type Shear } from '@keenroute/shared';
import type { RecipeSummaryDto } from './dto/ticket-response.dto';

/** The edge recipe in short lines for the phone; inside-edge work is planned when the line carries the hone. */
export function recipeSummary(shear: Shear, addOns: readonly AddOnCode[]): RecipeSummaryDto | null {
  try {
    const recipe = edgeRecipe(shear, { insideEdge: addOns.includes('inside-edge-hone') });
    const steps = recipe.steps.map((step) => {
      const grade = step.gradeRangeUm
        ? `${step.gradeRangeUm.minUm}–${step.gradeRangeUm.maxUm} µm`
        : `${step.gradeUm} µm${step.jis ? ` (JIS ${step.jis})` : ''}`;
      const surface = step.surface === 'disc' ? 'disc' : 'paste pad';
      return `${step.order}. ${surface} ${grade}, ${step.speed} speed, ${BLADE_SCOPE_LABELS[step.blades]}: ${step.lookFor}`;
    });
    if (recipe.insideEdge) {
      const edge = recipe.insideEdge;
      steps.push(`Inside edge: ${edge.stone} ${edge.jis} with ${edge.lubricant}. ${edge.note}`);
    }
    steps.push(`Finish: ${recipe.finish.description}`);
    return {
      steps,
      disassemble: recipe.disassemble,
      benchMinutes: recipe.benchMinutes,
      cautions: recipe.cautions,
      notes: recipe.notes,
      source: recipe.source,
    };
  } catch (error) {
    // A shear the rules cannot plan (an odd length, say) still shows on the ticket, just without a recipe.
    if (isRuleError(error)) return null;
    throw error;
  }
}
