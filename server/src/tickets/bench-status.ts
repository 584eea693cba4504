import { DomainError } from '../common/errors/domain-error';

/** Where a pair is at the bench, in Keenroute's words. */
export const BENCH_STATUSES = ['waiting', 'on-the-bench', 'ready', 'handed-back'] as const;
export type BenchStatus = (typeof BENCH_STATUSES)[number];

export const BENCH_STATUS_LABELS: Readonly<Record<BenchStatus, string>> = {
  waiting: 'waiting',
  'on-the-bench': 'on the bench',
  ready: 'ready',
  'handed-back': 'handed back',
};

/**
 * One step at a time, with a step back for a pair put down or re-worked (Keenroute's choice): waiting → on the bench
 * → ready → handed back. A pair handed back is with its owner and does not come back on this ticket.
 */
const NEXT: Readonly<Record<BenchStatus, readonly BenchStatus[]>> = {
  waiting: ['on-the-bench'],
  'on-the-bench': ['waiting', 'ready'],
  ready: ['on-the-bench', 'handed-back'],
  'handed-back': [],
};

export function canMove(from: BenchStatus, to: BenchStatus): boolean {
  return from === to || NEXT[from].includes(to);
}

/** Throws a clear refusal when a pair cannot go from one status to the other. */
export function checkBenchMove(from: BenchStatus, to: BenchStatus): void {
  if (canMove(from, to)) return;
  const allowed = NEXT[from].map((status) => `"${BENCH_STATUS_LABELS[status]}"`);
  const message =
    allowed.length === 0
      ? `This pair is ${BENCH_STATUS_LABELS[from]}; its bench status no longer changes.`
      : `A pair ${BENCH_STATUS_LABELS[from]} can go to ${allowed.join(' or ')}, not "${BENCH_STATUS_LABELS[to]}".`;
  throw new DomainError('conflict', message, { benchStatus: [message] });
}

/** A pair counts as done for finishing the ticket once it is ready or already back with its owner. */
export const isDone = (status: BenchStatus) => status === 'ready' || status === 'handed-back';
