/**
 * Builds the invented demo shears (1 to 6 a customer) and their service history. Tag codes are added when they are
 * inserted, from the database's sequence, in the order the shears were registered.
 */
import { addDays, edgeRecipe, type EdgeType, isToothed, type ShearStatus, type ToolKind } from '@keenroute/shared';
import type { Shear } from '../../shears/entities/shear.entity';
import type { ShearHistoryEntry } from '../../shears/entities/shear-history-entry.entity';
import type { CustomerPlan } from './demo-customers';
import { DEMO_GROOMING_MAKES, DEMO_HAIR_MAKES, DEMO_SHEAR_NOTES } from './demo-names';
import type { DemoRandom } from './demo-random';
import type { VisitRow } from './demo-stops';

export type ShearRow = Omit<Shear, 'updatedAt' | 'tagCode'>;
export type ShearHistoryRow = Omit<ShearHistoryEntry, 'createdAt'>;

type Weights<T> = readonly (readonly [T, number])[];
type Family = 'hair' | 'grooming';

const COUNT: Weights<number> = [
  [1, 12],
  [2, 24],
  [3, 30],
  [4, 18],
  [5, 10],
  [6, 6],
];
const TOOL_KINDS: Readonly<Record<Family, Weights<ToolKind>>> = {
  hair: [
    ['straight', 56],
    ['thinning', 24],
    ['blending', 10],
    ['curved', 10],
  ],
  grooming: [
    ['straight', 38],
    ['curved', 24],
    ['thinning', 14],
    ['blending', 12],
    ['chunker', 12],
  ],
};
const EDGE_TYPES: Readonly<Record<Family, Weights<EdgeType>>> = {
  hair: [
    ['convex', 62],
    ['semi-convex', 17],
    ['beveled', 15],
    ['serrated', 6],
  ],
  grooming: [
    ['beveled', 50],
    ['convex', 26],
    ['semi-convex', 14],
    ['serrated', 10],
  ],
};
// Quarter inches: hair shears mostly 5.5 to 7, grooming shears mostly 7 to 8.5.
const LENGTHS: Readonly<Record<Family, Readonly<Record<ToolKind, Weights<number>>>>> = {
  hair: {
    straight: [
      [5, 3],
      [5.5, 14],
      [5.75, 10],
      [6, 24],
      [6.25, 12],
      [6.5, 18],
      [6.75, 8],
      [7, 8],
      [7.5, 3],
    ],
    curved: [
      [6, 30],
      [6.5, 40],
      [7, 30],
    ],
    thinning: [
      [5.5, 15],
      [6, 40],
      [6.25, 15],
      [6.5, 25],
      [7, 5],
    ],
    blending: [
      [5.5, 15],
      [6, 40],
      [6.25, 15],
      [6.5, 25],
      [7, 5],
    ],
    chunker: [
      [6, 50],
      [6.5, 50],
    ],
  },
  grooming: {
    straight: [
      [7, 20],
      [7.5, 28],
      [8, 28],
      [8.5, 16],
      [9, 5],
      [10, 3],
    ],
    curved: [
      [6.5, 10],
      [7, 25],
      [7.5, 30],
      [8, 25],
      [8.5, 10],
    ],
    thinning: [
      [6.5, 10],
      [7, 30],
      [7.5, 35],
      [8, 20],
      [8.5, 5],
    ],
    blending: [
      [6.5, 10],
      [7, 30],
      [7.5, 35],
      [8, 20],
      [8.5, 5],
    ],
    chunker: [
      [7, 20],
      [7.5, 40],
      [8, 30],
      [8.5, 10],
    ],
  },
};
const TEETH: Readonly<Record<ToolKind, readonly number[]>> = {
  straight: [],
  curved: [],
  thinning: [26, 28, 30, 32, 35],
  blending: [40, 42, 46],
  chunker: [18, 20, 22],
};
const STATUS: Weights<ShearStatus> = [
  ['in-service', 93],
  ['retired', 5],
  ['lost', 2],
];
const STATUS_SUMMARIES: Readonly<Record<Exclude<ShearStatus, 'in-service'>, readonly string[]>> = {
  retired: [
    'Retired: blade cracked near the pivot.',
    'Retired by the owner: replaced with a new pair.',
    'Retired: worn too narrow to sharpen again.',
  ],
  lost: ['Reported lost by the owner.', 'Lost: not returned after a shop move.'],
};
/** The demo's mix of shears, for other invented registries (the report benchmark's) to draw from too. */
export const DEMO_SHEAR_MIX = { count: COUNT, toolKinds: TOOL_KINDS, edgeTypes: EDGE_TYPES, lengths: LENGTHS };

const EXTRAS = ['', '', '', '; tension set', '; pivot cleaned and oiled', '; small nick at the tip ground out'];

function makeAndModel(rng: DemoRandom, family: Family, toolKind: ToolKind): { make: string; model: string } {
  if (rng.chance(0.06)) return { make: '', model: '' };
  const line = rng.pick(family === 'hair' ? DEMO_HAIR_MAKES : DEMO_GROOMING_MAKES);
  if (rng.chance(0.1)) return { make: line.make, model: '' };
  const teeth = TEETH[toolKind];
  const model = rng.pick(line.models);
  return { make: line.make, model: teeth.length > 0 ? `${model} ${rng.pick(teeth)}T` : model };
}

// The recipe's step count depends only on these four; working it out once each keeps 900 shears fast.
const recipeSteps = new Map<string, number>();
function stepsFor(shear: ShearRow, insideEdge: boolean): number {
  const key = `${shear.edgeType}|${shear.toolKind}|${shear.use}|${insideEdge}`;
  let steps = recipeSteps.get(key);
  if (steps === undefined) {
    steps = edgeRecipe(shear, { insideEdge }).steps.length;
    recipeSteps.set(key, steps);
  }
  return steps;
}

/** "Sharpened: convex, 6 steps, inside edge honed": the step count follows the app's own edge recipe. */
function serviceSummary(rng: DemoRandom, shear: ShearRow): string {
  // Beveled and serrated recipes have no inside-edge work.
  const insideEdge = shear.edgeType !== 'beveled' && shear.edgeType !== 'serrated' && rng.chance(0.3);
  const parts = [`Sharpened: ${shear.edgeType}, ${stepsFor(shear, insideEdge)} steps`];
  if (isToothed(shear.toolKind)) parts.push('straight blade only');
  else if (shear.edgeType === 'serrated') parts.push('plain blade only');
  if (insideEdge) parts.push('inside edge honed');
  return parts.join(', ') + rng.pick(EXTRAS);
}

/** The visits this customer's shears could have been worked at: the earlier stop until the move, then this one. */
function timeline(customer: CustomerPlan): VisitRow[] {
  const { moved, since, stop } = customer;
  if (!moved) return stop.visits.filter((visit) => visit.workedOn >= since);
  return [
    ...moved.from.visits.filter((visit) => visit.workedOn >= moved.startedOn && visit.workedOn < moved.movedOn),
    ...stop.visits.filter((visit) => visit.workedOn >= moved.movedOn),
  ];
}

export interface ShearPlan {
  rows: ShearRow[];
  history: ShearHistoryRow[];
}

function shearFor(rng: DemoRandom, id: string, customer: CustomerPlan, toolKind: ToolKind): ShearRow {
  const family = customer.stop.spec.family;
  return {
    id,
    customerId: customer.row.id,
    ...makeAndModel(rng, family, toolKind),
    lengthIn: rng.weighted(LENGTHS[family][toolKind]),
    edgeType: rng.weighted(EDGE_TYPES[family]),
    toolKind,
    handedness: rng.chance(customer.leftHanded ? 0.9 : 0.015) ? 'left' : 'right',
    use: family,
    notes: rng.chance(0.08) ? rng.pick(DEMO_SHEAR_NOTES) : '',
    status: rng.weighted(STATUS),
    createdAt: new Date(0),
  };
}

/** Registered, serviced at many of the visits since, moved with its owner, and retired or lost at the end. */
function historyOf(
  rng: DemoRandom,
  shear: ShearRow,
  customer: CustomerPlan,
  today: string,
  newId: () => string,
): ShearHistoryRow[] {
  const visits = timeline(customer);
  const { moved } = customer;
  const stopName = (stopId: string) => (moved?.from.row.id === stopId ? moved.from : customer.stop).row.name;
  const entries: ShearHistoryRow[] = [];
  const add = (happenedOn: string, kind: ShearHistoryRow['kind'], summary: string, recordedBy: string | null) =>
    entries.push({ id: newId(), shearId: shear.id, happenedOn, kind, summary, ticketId: null, recordedBy });

  // Most pairs were tagged at the first visit, some later; without any visit, when the customer was entered.
  const first = visits.length === 0 ? -1 : rng.chance(0.8) ? 0 : rng.int(0, visits.length - 1);
  const tagged = visits[first];
  const registeredOn = tagged?.workedOn ?? [customer.since, addDays(today, -rng.int(1, 10))].sort()[1]!;
  shear.createdAt = new Date(`${registeredOn}T15:00:00Z`);
  const where = stopName(tagged?.stopId ?? customer.stop.row.id);
  add(registeredOn, 'registered', `Registered at ${where}.`, tagged?.sharpenerId ?? null);

  const since = first < 0 ? [] : visits.slice(first);
  const seen = shear.status === 'in-service' || since.length === 0 ? since.length : rng.int(1, since.length);
  since.slice(0, seen).forEach((visit, i) => {
    if (rng.chance(i === 0 ? 0.9 : 0.7)) add(visit.workedOn, 'serviced', serviceSummary(rng, shear), visit.sharpenerId);
  });
  const lastSeenOn = since[seen - 1]?.workedOn ?? registeredOn;
  if (moved && registeredOn < moved.movedOn && (shear.status === 'in-service' || lastSeenOn >= moved.movedOn)) {
    add(moved.movedOn, 'moved', `Moved with its owner from ${moved.from.row.name} to ${customer.stop.row.name}.`, null);
  }
  if (shear.status !== 'in-service') {
    const statusOn = [addDays(lastSeenOn, rng.int(1, 10)), today].sort()[0]!;
    add(statusOn, 'status', rng.pick(STATUS_SUMMARIES[shear.status]), null);
  }
  return entries;
}

export function buildDemoShears(
  rng: DemoRandom,
  customers: readonly CustomerPlan[],
  today: string,
  newId: () => string,
): ShearPlan {
  const rows: ShearRow[] = [];
  const history: ShearHistoryRow[] = [];
  for (const customer of customers) {
    // Jo Marlow, the demo client, gets a full case to look at.
    const count = customer.row.userId !== null ? 4 : rng.weighted(COUNT);
    for (let n = 0; n < count; n++) {
      // Everyone has a main straight shear; the rest follow the trade's mix.
      const toolKind = n === 0 ? 'straight' : rng.weighted(TOOL_KINDS[customer.stop.spec.family]);
      const shear = shearFor(rng, newId(), customer, toolKind);
      history.push(...historyOf(rng, shear, customer, today, newId));
      rows.push(shear);
    }
  }
  // Tags were handed out as shears were registered: the oldest pair gets the lowest number (the sort is stable).
  rows.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
  return { rows, history };
}
