import Papa from 'papaparse';
import type { ImportRunner } from '../kinds/import-handler';

/** The header and one invented example row, CRLF line ends as RFC 4180 and spreadsheets expect. */
export function templateCsv(runner: ImportRunner): string {
  const fields = [...runner.columns];
  const example = fields.map((column) => runner.example[column] ?? '');
  return `${Papa.unparse({ fields, data: [example] }, { newline: '\r\n' })}\r\n`;
}
