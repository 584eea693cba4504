/** What a CSV file may bring in (the server's import kinds). */
export const IMPORT_KINDS = ['stops', 'customers', 'shears'] as const;
export type ImportKind = (typeof IMPORT_KINDS)[number];

/** One problem in a file; `row` counts from 1 at the first data row, so it sits on line row + 1 of the file. */
export interface ImportRowError {
  row: number;
  column: string | null;
  message: string;
}

export interface ImportPreview {
  id: string;
  kind: ImportKind;
  fileName: string;
  rowCount: number;
  validCount: number;
  errors: ImportRowError[];
  sample: Record<string, string>[];
  canCommit: boolean;
}

export interface ImportResult {
  kind: ImportKind;
  created: number;
}

/** Largest file the server takes. */
export const MAX_IMPORT_BYTES = 5 * 1024 * 1024;
