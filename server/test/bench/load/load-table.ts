import type { Result } from 'autocannon';
import type { LoadKind, RouteRecord } from './load-mix';
import { round1 } from '../bench-stats';

/** p95 targets on this machine (issue 9): reads at most 100 ms, writes at most 200 ms. */
export const P95_TARGET_MS: Readonly<Record<LoadKind, number>> = { reads: 100, writes: 200 };

/** A latency figure, or a dash when the route had no answer to measure. */
const ms = (value: number): number | string => (Number.isNaN(value) ? '-' : round1(value));

/** Nearest-rank percentile of an ascending list. */
export function percentile(sorted: readonly number[], share: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.max(0, Math.ceil(share * sorted.length) - 1)]!;
}

const non2xx = (records: readonly RouteRecord[]) =>
  records.reduce(
    (sum, record) =>
      sum + [...record.statuses].reduce((n, [status, count]) => n + (status >= 200 && status < 300 ? 0 : count), 0),
    0,
  );

function figures(records: readonly RouteRecord[], seconds: number) {
  const sorted = records.flatMap((record) => record.latencies).sort((a, b) => a - b);
  return {
    requests: sorted.length,
    reqPerSec: round1(sorted.length / seconds),
    p50Ms: ms(percentile(sorted, 0.5)),
    p95Ms: ms(percentile(sorted, 0.95)),
    p99Ms: ms(percentile(sorted, 0.99)),
    non2xx: non2xx(records),
  };
}

export interface KindRow {
  kind: string;
  connections: number;
  requests: number;
  reqPerSec: number;
  p50Ms: number | string;
  p95Ms: number | string;
  p99Ms: number | string;
  non2xx: number;
  'errors/timeouts': string;
  p95Target: string;
  met: string;
}

/** One row for the reads, one for the writes and one for both together. */
export function kindRows(records: readonly RouteRecord[], results: Readonly<Record<LoadKind, Result>>): KindRow[] {
  const seconds = Math.max(results.reads.duration, results.writes.duration);
  const row = (kind: LoadKind | 'all'): KindRow => {
    const mine = records.filter((record) => kind === 'all' || record.kind === kind);
    const ran = kind === 'all' ? [results.reads, results.writes] : [results[kind]];
    const f = figures(mine, kind === 'all' ? seconds : results[kind].duration);
    const errors = ran.reduce((n, r) => n + r.errors, 0);
    const timeouts = ran.reduce((n, r) => n + r.timeouts, 0);
    const target = kind === 'all' ? undefined : P95_TARGET_MS[kind];
    return {
      kind,
      connections: ran.reduce((n, r) => n + r.connections, 0),
      ...f,
      'errors/timeouts': `${errors}/${timeouts}`,
      p95Target: target === undefined ? '-' : `<= ${target} ms`,
      met: target === undefined ? '-' : typeof f.p95Ms === 'number' && f.p95Ms <= target ? 'yes' : 'NO',
    };
  };
  return [row('reads'), row('writes'), row('all')];
}

/** The same figures route by route, to show which one is slow or failing. */
export function routeRows(records: readonly RouteRecord[], results: Readonly<Record<LoadKind, Result>>) {
  return records.map((record) => {
    const f = figures([record], results[record.kind].duration);
    return {
      route: record.name,
      kind: record.kind,
      requests: f.requests,
      reqPerSec: f.reqPerSec,
      p50Ms: f.p50Ms,
      p95Ms: f.p95Ms,
      p99Ms: f.p99Ms,
      non2xx: f.non2xx,
    };
  });
}
