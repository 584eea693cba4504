import {
  isRuleError,
  RuleError,
  SHEAR_STATUS_LABELS,
  validateShear,
  type EdgeType,
  type Handedness,
  type ShearStatus,
  type ShearUse,
  type ToolKind,
} from '@keenroute/shared';

export interface ShearShape {
  edgeType: EdgeType;
  toolKind: ToolKind;
  lengthIn: number;
  handedness: Handedness;
  use: ShearUse;
}

/** Runs the shared shear rules, naming the refused field as the request body does (lengthIn, not shear.lengthIn). */
export function checkedShear(shape: ShearShape): ShearShape {
  try {
    const clean = validateShear(shape, 'shear');
    return { ...clean, use: clean.use ?? shape.use };
  } catch (error) {
    if (isRuleError(error)) throw new RuleError(error.code, error.message, error.field?.replace(/^shear\./, ''));
    throw error;
  }
}

/** The history line of a status change: "Marked lost", "Marked retired", "Back in service". */
export function statusSummary(to: ShearStatus): string {
  return to === 'in-service' ? 'Back in service' : `Marked ${SHEAR_STATUS_LABELS[to]}`;
}

export function movedSummary(fromCustomer: string, toCustomer: string): string {
  return `Moved from ${fromCustomer} to ${toCustomer}`;
}
