/**
 * The PDF benchmark: draws an invoice, a 60-line invoice and a sheet of shear labels in memory, as the API does for
 * each download, and prints the first (cold: fonts unpacked, code warmed) and the median of the rest.
 *
 *   npm run bench:pdf          (from the top of the checkout; no database)
 *
 * BENCH_ROUNDS changes the measured rounds (20). The documents are the invented demo invoice of the unit tests.
 */
import { cpus, loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { renderInvoicePdf } from '../../src/invoices/documents/invoice-pdf';
import { LABELS_PER_SHEET } from '../../src/shears/label-sheet';
import { renderLabels } from '../../src/shears/shear-labels.service';
import { demoDocument } from '../utils/invoice-document-fixture';
import { median, round1 } from './bench-stats';

const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 20);

const long = demoDocument();
long.lines = Array.from({ length: 60 }, (_, i) => ({ ...long.lines[0]!, id: `l${i}`, position: i }));
const labels = Array.from({ length: LABELS_PER_SHEET }, (_, i) => ({
  tagCode: `KR-${String(i + 1).padStart(6, '0')}`,
  customerName: 'Wren Talbot (demo)',
  make: 'Larkhaven Steel (demo)',
  model: 'Straight 6.5',
  lengthIn: 6.5,
  toolKind: 'straight' as const,
}));

const DOCUMENTS: [string, () => Promise<Buffer>][] = [
  ['invoice, 3 lines', () => renderInvoicePdf(demoDocument(), null)],
  ['invoice, 60 lines', () => renderInvoicePdf(long, null)],
  [`shear labels, ${LABELS_PER_SHEET}`, () => renderLabels(labels)],
];

async function main(): Promise<void> {
  const rows = [];
  for (const [name, render] of DOCUMENTS) {
    const times: number[] = [];
    let bytes = 0;
    for (let round = 0; round <= ROUNDS; round++) {
      const started = performance.now();
      bytes = (await render()).length;
      times.push(performance.now() - started);
    }
    rows.push({
      document: name,
      kib: round1(bytes / 1024),
      firstMs: round1(times[0]!),
      medianMs: round1(median(times.slice(1))),
    });
  }
  console.log(`PDF benchmark: ${ROUNDS} rounds after the first; Node ${process.version}, ${cpus().length} cores`);
  console.log(
    `load average before: ${loadavg()
      .map((n) => n.toFixed(2))
      .join(', ')}`,
  );
  console.table(rows);
}

void main();
