import { setImmediate as nextTurn } from 'node:timers/promises';

/** Rows checked between two turns of the event loop: a few milliseconds of work at most. */
export const ROWS_PER_TURN = 250;

/** Visits every item in order, letting other requests run between chunks so a big file never blocks the server. */
export async function forEachInChunks<T>(
  items: readonly T[],
  visit: (item: T, index: number) => void,
  size = ROWS_PER_TURN,
): Promise<void> {
  for (let start = 0; start < items.length; start += size) {
    if (start > 0) await nextTurn();
    const end = Math.min(start + size, items.length);
    for (let index = start; index < end; index += 1) visit(items[index]!, index);
  }
}

/** Splits rows into groups for multi-row INSERTs (one statement per group keeps the bind parameters in bounds). */
export function chunksOf<T>(items: readonly T[], size: number): T[][] {
  const chunks: T[][] = [];
  for (let start = 0; start < items.length; start += size) chunks.push(items.slice(start, start + size));
  return chunks;
}
