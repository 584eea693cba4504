import { DomainError } from '../common/errors/domain-error';
import { BENCH_STATUSES, canMove, checkBenchMove, isDone } from './bench-status';

describe('bench status', () => {
  it('moves one step forward or back, and never out of "handed back"', () => {
    const allowed = BENCH_STATUSES.flatMap((from) =>
      BENCH_STATUSES.filter((to) => to !== from && canMove(from, to)).map((to) => `${from}→${to}`),
    );
    expect(allowed).toEqual([
      'waiting→on-the-bench',
      'on-the-bench→waiting',
      'on-the-bench→ready',
      'ready→on-the-bench',
      'ready→handed-back',
    ]);
  });

  it('refuses a skipped step with the words the sharpener sees', () => {
    expect(() => checkBenchMove('waiting', 'ready')).toThrow(/can go to "on the bench", not "ready"/);
    expect(() => checkBenchMove('handed-back', 'ready')).toThrow(DomainError);
    expect(() => checkBenchMove('handed-back', 'ready')).toThrow(/no longer changes/);
    expect(() => checkBenchMove('ready', 'ready')).not.toThrow();
  });

  it('counts ready and handed back as done', () => {
    expect(BENCH_STATUSES.filter(isDone)).toEqual(['ready', 'handed-back']);
  });
});
