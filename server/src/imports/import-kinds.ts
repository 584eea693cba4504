/** What a CSV file may bring in. */
export const IMPORT_KINDS = ['stops', 'customers', 'shears'] as const;
export type ImportKind = (typeof IMPORT_KINDS)[number];

export const IMPORT_STATUSES = ['previewed', 'committed'] as const;
export type ImportStatus = (typeof IMPORT_STATUSES)[number];

/** One problem found in a file: row counts from 1 at the first data row under the header. */
export interface ImportRowError {
  row: number;
  column: string | null;
  message: string;
}

/** As kept with the import: problems with the file's structure are marked, since re-checking rows cannot see them. */
export interface StoredRowError extends ImportRowError {
  fromFile?: true;
}

/** A data row as read from the file: column name to its text, trimmed. */
export type CsvRecord = Record<string, string>;
