import type { EntityManager } from 'typeorm';

/** KR: invoices; CN: credit notes. */
export type DocumentSeries = 'KR' | 'CN';

/**
 * The next number of a series in a year, taken inside the caller's transaction: the counter row stays locked until it
 * commits, so concurrent issuers (in any process) queue on it and get consecutive numbers, and a rollback hands the
 * number back. That is what keeps the sequence gapless.
 */
export async function takeDocumentNumber(
  manager: EntityManager,
  series: DocumentSeries,
  year: number,
): Promise<string> {
  const rows = await manager.query<{ last_number: number }[]>(
    `INSERT INTO document_counters (series, year, last_number) VALUES ($1, $2, 1)
     ON CONFLICT (series, year) DO UPDATE SET last_number = document_counters.last_number + 1
     RETURNING last_number`,
    [series, year],
  );
  const row = rows[0];
  if (!row) throw new Error(`No number came back for ${series} ${year}`);
  return formatDocumentNumber(series, year, row.last_number);
}

/** KR-2026-0001; past 9999 the number simply grows a digit. */
export const formatDocumentNumber = (series: DocumentSeries, year: number, sequence: number) =>
  `${series}-${year}-${String(sequence).padStart(4, '0')}`;
