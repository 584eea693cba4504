import type { ImportKind } from '../import-kinds';
import type { ImportRunner } from '../kinds/import-handler';
import type { ParsedCsv } from './parse-csv';

const plural = (count: number, one: string, many: string) => (count === 1 ? one : many);

/** What is wrong with the header row for this kind of file, in one message, or null when it is fine. */
export function headerProblem(kind: ImportKind, runner: ImportRunner, parsed: ParsedCsv): string | null {
  const known = new Set(runner.columns);
  const unknown = parsed.columns.filter((column) => !known.has(column));
  const missing = runner.required.filter((column) => !parsed.columns.includes(column));
  const problems: string[] = [];
  if (missing.length > 0) {
    problems.push(
      `${plural(missing.length, 'A required column is', 'Required columns are')} missing: ${missing.join(', ')}.`,
    );
  }
  if (unknown.length > 0) {
    problems.push(
      `${plural(unknown.length, 'This column is', 'These columns are')} not part of a ${kind} file: ${unknown.join(', ')}. ` +
        `The columns are: ${runner.columns.join(', ')}.`,
    );
  }
  if (parsed.repeatedColumns.length > 0) {
    problems.push(`The header names ${parsed.repeatedColumns.join(', ')} more than once.`);
  }
  if (parsed.unnamedColumnsWithValues.length > 0) {
    const positions = parsed.unnamedColumnsWithValues.join(', ');
    problems.push(
      `${plural(parsed.unnamedColumnsWithValues.length, 'Column', 'Columns')} ${positions} ha${plural(parsed.unnamedColumnsWithValues.length, 's', 've')} values but no name in the header.`,
    );
  }
  return problems.length > 0 ? problems.join(' ') : null;
}
