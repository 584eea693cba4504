import { within } from '@testing-library/react';

/** The text of each cell of a report table's row, left to right, as the page shows it. */
export function rowCells(row: HTMLElement): string[] {
  return within(row)
    .getAllByRole('cell')
    .map((cell) => cell.textContent ?? '');
}
