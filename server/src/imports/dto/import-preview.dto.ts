import { ApiProperty } from '@nestjs/swagger';
import type { CsvImport } from '../entities/csv-import.entity';
import { IMPORT_KINDS, type CsvRecord, type ImportKind, type StoredRowError } from '../import-kinds';

/** Rows shown in the preview's sample table. */
export const SAMPLE_ROWS = 20;
/** Problems sent back at most; a file with more is fixed in the spreadsheet, not read line by line here. */
export const ERRORS_SHOWN_MAX = 1000;

export class ImportRowErrorDto {
  @ApiProperty({ description: 'Data row, from 1 at the first row under the header (line row + 1 of the file)' })
  row: number;
  @ApiProperty({ nullable: true, type: String, description: 'The column, or null for the whole row' })
  column: string | null;
  @ApiProperty() message: string;
}

export class ImportPreviewDto {
  @ApiProperty() id: string;
  @ApiProperty({ enum: IMPORT_KINDS }) kind: ImportKind;
  @ApiProperty() fileName: string;
  @ApiProperty() rowCount: number;
  @ApiProperty({ description: 'Rows with no problem' }) validCount: number;
  @ApiProperty({ type: [ImportRowErrorDto], description: `The first ${ERRORS_SHOWN_MAX} problems, by row` })
  errors: ImportRowErrorDto[];
  @ApiProperty({ description: `The first ${SAMPLE_ROWS} rows as read`, type: 'array', items: { type: 'object' } })
  sample: CsvRecord[];
  @ApiProperty({ description: 'True when every row is good and the file has not been imported yet' })
  canCommit: boolean;
}

export class CommitResultDto {
  @ApiProperty({ enum: IMPORT_KINDS }) kind: ImportKind;
  @ApiProperty({ description: 'Records created' }) created: number;
}

export const toRowErrors = (errors: readonly StoredRowError[]): ImportRowErrorDto[] =>
  errors.slice(0, ERRORS_SHOWN_MAX).map(({ row, column, message }) => ({ row, column, message }));

export const rowsWithErrors = (errors: readonly StoredRowError[]): number => new Set(errors.map((e) => e.row)).size;

export const toImportPreview = (record: CsvImport): ImportPreviewDto => ({
  id: record.id,
  kind: record.kind,
  fileName: record.fileName,
  rowCount: record.rowCount,
  validCount: record.rowCount - rowsWithErrors(record.errors),
  errors: toRowErrors(record.errors),
  sample: record.rows.slice(0, SAMPLE_ROWS),
  canCommit: record.status === 'previewed' && record.errors.length === 0 && record.rowCount > 0,
});

/** A refused commit's problems as the error body's fields: "rows.12.email" (or "rows.12" for the whole row). */
export function rowErrorFields(errors: readonly StoredRowError[]): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const error of toRowErrors(errors)) {
    (fields[error.column === null ? `rows.${error.row}` : `rows.${error.row}.${error.column}`] ??= []).push(
      error.message,
    );
  }
  return fields;
}
