import type { DiscStepRule, FinishRule, InsideEdgeRule, RecipeEntry, RecipeTable } from './types.js';

const FULL_BURR = 'a full, even burr from pivot to tip; fold it off before the next disc';

/**
 * Discs coarse to fine, 80, 60, 30, 15, 9 µm, each until a full, even burr (common practice). Speeds: coarse discs
 * high with little time on the blade, slower on 30 and 15 µm (common practice); 9 µm at medium is Keenroute's default.
 */
export const DEFAULT_DISC_STEPS: readonly DiscStepRule[] = [
  {
    gradeUm: 80,
    speed: 'high',
    speedNote: 'Higher speed, little time on the blade, to keep heat down.',
    lookFor: `Nicks and flat spots gone, and ${FULL_BURR}.`,
  },
  {
    gradeUm: 60,
    speed: 'high',
    speedNote: 'Higher speed, little time on the blade, to keep heat down.',
    lookFor: `The 80 µm scratches gone, and ${FULL_BURR}.`,
  },
  {
    gradeUm: 30,
    speed: 'medium',
    speedNote: 'Slower.',
    lookFor: `The 60 µm scratches gone, and ${FULL_BURR}.`,
  },
  {
    gradeUm: 15,
    speed: 'medium',
    speedNote: 'Slower.',
    lookFor: `The 30 µm scratches gone, and ${FULL_BURR}.`,
  },
  {
    gradeUm: 9,
    speed: 'medium',
    speedNote: 'Slower.',
    lookFor: 'The 15 µm scratches gone and an even, fine finish with a full, even burr; fold it off.',
  },
];

/** Beveled edges and every grooming shear finish at the last disc (common practice). */
const LAST_DISC: FinishRule = { kind: 'last-disc' };

/** Convex edges on human-hair shears go on to a diamond-paste felt pad rated 3 to 7 µm, at the highest speed (common practice). */
const PASTE_PAD: FinishRule = {
  kind: 'paste-pad',
  minUm: 3,
  maxUm: 7,
  speed: 'highest',
  lookFor: 'An even polish along the whole convex edge, no disc scratches left.',
};

/** Convex shears needing inside-edge work: taken apart, fine stone of about 6000 grit (JIS), a little water (common practice). */
export const DEFAULT_INSIDE_EDGE: InsideEdgeRule = {
  stone: 'fine water stone',
  jisGrit: 6000,
  lubricant: 'a little water',
  note: 'Take the shear apart and re-establish the inside edge flat on the stone; reassemble and set the tension before handing back.',
};

const TEETH_NOTE = 'Toothed shear: the straight blade is sharpened; the teeth are not ground.';
const SERRATIONS_NOTE =
  'Serrations are kept: no step grinds the serrated blade. If both blades are serrated, skip the discs and send the shear to its maker for re-serrating.';
const SERRATED_TOOTHED_NOTE =
  'Serrations are kept: if the straight blade is the serrated one, it is not put on the discs either; send the shear to its maker.';

const beveledCutting: RecipeEntry = {
  discs: DEFAULT_DISC_STEPS,
  blades: 'both-blades',
  finish: { hair: LAST_DISC, grooming: LAST_DISC },
  wipe: true,
  insideEdge: null,
  notes: [],
  cautions: [],
};
const beveledToothed: RecipeEntry = { ...beveledCutting, blades: 'straight-blade', notes: [TEETH_NOTE] };

const convexCutting: RecipeEntry = {
  discs: DEFAULT_DISC_STEPS,
  blades: 'both-blades',
  finish: { hair: PASTE_PAD, grooming: LAST_DISC },
  wipe: true,
  insideEdge: DEFAULT_INSIDE_EDGE,
  notes: [],
  cautions: [],
};
const convexToothed: RecipeEntry = { ...convexCutting, blades: 'straight-blade', notes: [TEETH_NOTE] };

// Semi-convex follows convex (pad finish for hair, inside edge when asked): Keenroute's default, common practice.
const semiConvexCutting: RecipeEntry = { ...convexCutting };
const semiConvexToothed: RecipeEntry = { ...convexToothed };

const serratedCutting: RecipeEntry = {
  discs: DEFAULT_DISC_STEPS,
  blades: 'plain-blade',
  finish: { hair: LAST_DISC, grooming: LAST_DISC },
  wipe: true,
  insideEdge: null,
  notes: [SERRATIONS_NOTE],
  cautions: [],
};
const serratedToothed: RecipeEntry = {
  ...serratedCutting,
  blades: 'straight-blade',
  notes: [TEETH_NOTE, SERRATED_TOOTHED_NOTE],
};

/** Keenroute's default recipes, one cell per edge type and tool kind; every fact in them is common practice. */
export const DEFAULT_RECIPE_TABLE: RecipeTable = {
  beveled: {
    straight: beveledCutting,
    curved: beveledCutting,
    thinning: beveledToothed,
    blending: beveledToothed,
    chunker: beveledToothed,
  },
  convex: {
    straight: convexCutting,
    curved: convexCutting,
    thinning: convexToothed,
    blending: convexToothed,
    chunker: convexToothed,
  },
  'semi-convex': {
    straight: semiConvexCutting,
    curved: semiConvexCutting,
    thinning: semiConvexToothed,
    blending: semiConvexToothed,
    chunker: semiConvexToothed,
  },
  serrated: {
    straight: serratedCutting,
    curved: serratedCutting,
    thinning: serratedToothed,
    blending: serratedToothed,
    chunker: serratedToothed,
  },
};
