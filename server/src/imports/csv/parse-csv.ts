import Papa from 'papaparse';
import { Readable } from 'node:stream';
import { setImmediate as nextTurn } from 'node:timers/promises';
import type { CsvRecord, ImportRowError } from '../import-kinds';

/** Text handed to the parser at a time: about a millisecond of work, then other requests get their turn. */
const SLICE_CHARS = 64 * 1024;
const UNNAMED = '\u0000unnamed:';
const REPEATED = '\u0000repeated:';

export interface ParsedCsv {
  /** The header's column names, trimmed and lower-cased, in file order (nameless and repeated ones left out). */
  columns: string[];
  /** Names that appear more than once in the header. */
  repeatedColumns: string[];
  /** 1-based positions of header cells with no name but with values under them. */
  unnamedColumnsWithValues: number[];
  rows: CsvRecord[];
  /** Rows the parser could not split cleanly (a value count that differs from the header, a broken quote). */
  problems: ImportRowError[];
}

async function* slices(text: string): AsyncGenerator<string> {
  for (let start = 0; start < text.length; start += SLICE_CHARS) {
    if (start > 0) await nextTurn();
    yield text.slice(start, start + SLICE_CHARS);
  }
}

function describe(error: Papa.ParseError): string {
  switch (error.code) {
    case 'TooManyFields':
      return 'This row has more values than the header has columns (check for a comma inside an unquoted value).';
    case 'TooFewFields':
      return 'This row has fewer values than the header has columns.';
    case 'MissingQuotes':
    case 'InvalidQuotes':
      return 'A quoted value in this row is not closed, or a quote inside it is not doubled ("").';
    case 'UndetectableDelimiter':
      return 'The values are not separated by commas.';
    default:
      return error.message;
  }
}

/**
 * Parses CSV text with papaparse (header row, blank lines skipped, names trimmed), feeding it in slices that wait a
 * turn of the event loop between them, so a 5 MB file never holds up other requests for long.
 */
export function parseCsv(text: string): Promise<ParsedCsv> {
  const seen = new Set<string>();
  const repeated = new Set<string>();
  const unnamed = new Set<number>();
  const rows: CsvRecord[] = [];
  const problems: ImportRowError[] = [];

  const transformHeader = (header: string, index: number): string => {
    const name = header.trim().toLowerCase();
    if (name === '') return `${UNNAMED}${index + 1}`;
    if (seen.has(name)) {
      repeated.add(name);
      return `${REPEATED}${index + 1}`;
    }
    seen.add(name);
    return name;
  };

  const keep = (data: Record<string, unknown>): CsvRecord => {
    const record: CsvRecord = {};
    for (const [key, value] of Object.entries(data)) {
      if (typeof value !== 'string') continue; // the parser's list of extra values, reported as a problem already
      if (key.startsWith(UNNAMED)) {
        if (value.trim() !== '') unnamed.add(Number(key.slice(UNNAMED.length)));
      } else if (!key.startsWith(REPEATED)) {
        record[key] = value.trim();
      }
    }
    return record;
  };

  return new Promise((resolve, reject) => {
    Papa.parse<Record<string, unknown>>(Readable.from(slices(text)), {
      header: true,
      skipEmptyLines: 'greedy',
      transformHeader,
      chunk: (results) => {
        for (const error of results.errors) {
          // The parser counts data rows from 0; Keenroute counts them from 1.
          if (error.row !== undefined) problems.push({ row: error.row + 1, column: null, message: describe(error) });
        }
        for (const data of results.data) rows.push(keep(data));
      },
      complete: () =>
        resolve({
          columns: [...seen],
          repeatedColumns: [...repeated],
          unnamedColumnsWithValues: [...unnamed].sort((a, b) => a - b),
          rows,
          problems: problems.sort((a, b) => a.row - b.row),
        }),
      error: (error: Error) => reject(error),
    });
  });
}
