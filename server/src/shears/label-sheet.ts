import { formatLength, TOOL_KIND_LABELS, type ToolKind } from '@keenroute/shared';
import { create } from 'qrcode';

/** A US Letter sheet of 30 labels, 2 5/8 x 1 in, in 3 columns and 10 rows; all sizes in PDF points (72 per inch). */
export const SHEET = {
  width: 612,
  height: 792,
  columns: 3,
  rows: 10,
  labelWidth: 189,
  labelHeight: 72,
  marginLeft: 13.5,
  marginTop: 36,
  columnGap: 9,
} as const;

export const LABELS_PER_SHEET = SHEET.columns * SHEET.rows;

export interface LabelSlot {
  page: number;
  x: number;
  y: number;
}

/** Where the label at this position (0 upward) goes: filled row by row, left to right, then the next sheet. */
export function labelSlot(index: number): LabelSlot {
  const slot = index % LABELS_PER_SHEET;
  const column = slot % SHEET.columns;
  const row = Math.floor(slot / SHEET.columns);
  return {
    page: Math.floor(index / LABELS_PER_SHEET),
    x: SHEET.marginLeft + column * (SHEET.labelWidth + SHEET.columnGap),
    y: SHEET.marginTop + row * SHEET.labelHeight,
  };
}

export interface LabelContent {
  tagCode: string;
  customerName: string;
  make: string;
  model: string;
  lengthIn: number;
  toolKind: ToolKind;
}

/** "Corvane Series 7, 6.5 in"; without a make or model the tool kind stands in: "thinning shear, 6 in". */
export function labelDescription(label: LabelContent): string {
  const name = [label.make, label.model].filter((part) => part.trim() !== '').join(' ');
  return `${name || TOOL_KIND_LABELS[label.toolKind]}, ${formatLength(label.lengthIn)}`;
}

/** One horizontal run of dark QR modules, in module units from the symbol's top-left corner. */
export interface ModuleRun {
  row: number;
  column: number;
  length: number;
}

/**
 * The QR code of a tag code (error correction M) as runs of dark modules, for drawing as vector rectangles:
 * crisp at any printer resolution, and far cheaper than encoding and embedding a PNG per label.
 */
export function qrModuleRuns(text: string): { size: number; runs: ModuleRun[] } {
  const { modules } = create(text, { errorCorrectionLevel: 'M' });
  const runs: ModuleRun[] = [];
  for (let row = 0; row < modules.size; row++) {
    let start = -1;
    for (let column = 0; column <= modules.size; column++) {
      const dark = column < modules.size && modules.get(row, column) === 1;
      if (dark && start < 0) start = column;
      if (!dark && start >= 0) {
        runs.push({ row, column: start, length: column - start });
        start = -1;
      }
    }
  }
  return { size: modules.size, runs };
}
