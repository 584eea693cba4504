import {
  EDGE_TYPES,
  HANDEDNESS,
  isRuleError,
  SHEAR_USES,
  TOOL_KINDS,
  validateLength,
  validateShear,
  type EdgeType,
  type Handedness,
  type ShearUse,
  type ToolKind,
} from '@keenroute/shared';
import type { CsvRecord } from '../import-kinds';
import { asCode, RowReader, type CellProblem, type RowRead } from './row-reader';

export const SHEAR_COLUMNS = [
  'customer_email',
  'make',
  'model',
  'length_in',
  'edge_type',
  'tool_kind',
  'handedness',
  'use',
  'notes',
] as const;
export const SHEAR_REQUIRED_COLUMNS = ['customer_email', 'length_in', 'edge_type', 'tool_kind'] as const;

export interface ShearDraft {
  customerEmail: string;
  make: string;
  model: string;
  lengthIn: number;
  edgeType: EdgeType;
  toolKind: ToolKind;
  handedness: Handedness;
  use: ShearUse;
  notes: string;
}

export interface ShearReady extends ShearDraft {
  customerId: string;
}

/** Which column each field of the shared shear rules stands for, to place a RuleError on its cell. */
const COLUMN_OF_FIELD: Record<string, string> = {
  'shear.edgeType': 'edge_type',
  'shear.toolKind': 'tool_kind',
  'shear.lengthIn': 'length_in',
  'shear.handedness': 'handedness',
  'shear.use': 'use',
};

/** "6.5", '6.5"' and "6.5 in" all read as 6.5 inches. */
function lengthCell(reader: RowReader): number | undefined {
  const text = reader
    .raw('length_in')
    .replace(/\s*(in|inch|inches|")$/i, '')
    .trim();
  if (text === '') {
    reader.problem('length_in', 'length_in is required: the length in inches, like 6.5.');
    return undefined;
  }
  const value = /^\d+(\.\d+)?$/.test(text) ? Number(text) : Number.NaN;
  return reader.rule('length_in', () => validateLength(value, 'length_in'));
}

export function readShearRow(record: CsvRecord): RowRead<ShearDraft> {
  // Micro-serrated counts as serrated (PRODUCT.md's edge types).
  const microSerrated = asCode(record.edge_type ?? '') === 'micro-serrated';
  const reader = new RowReader(microSerrated ? { ...record, edge_type: 'serrated' } : record);
  const customerEmail = reader.email('customer_email', true);
  const make = reader.text('make', 80);
  const model = reader.text('model', 80);
  const lengthIn = lengthCell(reader);
  const edgeType = reader.choice('edge_type', EDGE_TYPES);
  const toolKind = reader.choice('tool_kind', TOOL_KINDS);
  const handedness = reader.choice('handedness', HANDEDNESS, 'right');
  const use = reader.choice('use', SHEAR_USES, 'hair');
  const notes = reader.text('notes', 2000);
  // The cells passed one by one; the shared rules have the last word on the shear as a whole.
  if (reader.problems.length === 0) {
    try {
      validateShear({ edgeType, toolKind, lengthIn, handedness, use });
    } catch (error) {
      if (!isRuleError(error)) throw error;
      reader.problem(COLUMN_OF_FIELD[error.field ?? ''] ?? null, error.message);
    }
  }
  return reader.result(() => ({
    customerEmail: customerEmail!,
    make,
    model,
    lengthIn: lengthIn!,
    edgeType: edgeType!,
    toolKind: toolKind!,
    handedness: handedness!,
    use: use!,
    notes,
  }));
}

/** Resolves each shear's customer by e-mail from one look-up of every e-mail in the file. */
export function shearResolver(
  customerIdByEmail: ReadonlyMap<string, string>,
): (draft: ShearDraft) => { ready: ShearReady | null; problems: CellProblem[] } {
  return (draft) => {
    const customerId = customerIdByEmail.get(draft.customerEmail);
    if (customerId !== undefined) return { ready: { ...draft, customerId }, problems: [] };
    const message = `No customer has the e-mail ${draft.customerEmail}: import or add the customer first.`;
    return { ready: null, problems: [{ column: 'customer_email', message }] };
  };
}
