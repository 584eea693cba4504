import { EDGE_TYPES, TOOL_KINDS } from '@keenroute/shared';
import type { Request } from 'autocannon';
import { randomUUID } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import type { LoadTargets } from './load-targets';
import type { Sessions } from './sessions';

export type LoadKind = 'reads' | 'writes';

/** What one route of the mix answered during the run: its latencies and status codes, and a few failures to show. */
export interface RouteRecord {
  name: string;
  kind: LoadKind;
  latencies: number[];
  statuses: Map<number, number>;
  failures: string[];
}

interface Call {
  method: 'GET' | 'POST' | 'PATCH';
  path: string;
  headers: Record<string, string>;
  body?: unknown;
}

interface Route {
  record: RouteRecord;
  /** The next request of this route. */
  build: () => Call;
}

interface Timing {
  route?: RouteRecord;
  sentAt?: number;
  path?: string;
}

const PAGE_SIZE = 25;
const STOP_SORTS = ['name', 'city', 'nextDueOn', 'createdAt'];
const SHEAR_SORTS = ['tagCode', 'make', 'customer', 'createdAt'];
const KEPT_FAILURES = 5;

/**
 * The public routes are limited per address (bookings/public-rate-limits.ts). Each public request comes from an
 * invented visitor address in X-Forwarded-For, which the server trusts from one loopback proxy hop (main.ts), as it
 * would from its load balancer: many groomers each well under the limits, and the limits themselves unchanged.
 */
let visitors = 0;
function visitorAddress(): string {
  const n = ++visitors;
  return `10.${(n >> 16) & 255}.${(n >> 8) & 255}.${n & 255}`;
}

const json = { 'Content-Type': 'application/json' };

/**
 * The routes of the reads and of the writes. Every route walks through its own targets (day sheets, pages, search
 * texts, open pairs) one request after the other, so the connections together do not ask for one thing over and over.
 */
export class LoadMix {
  readonly records = new Map<string, RouteRecord>();
  private readonly readList: Route[];
  private readonly writeList: Route[];

  constructor(
    private readonly targets: LoadTargets,
    private readonly sessions: Sessions,
    private readonly office: string,
    private readonly listPages: number,
  ) {
    this.readList = this.readRoutes();
    this.writeList = this.writeRoutes();
  }

  /** The reading connections' request list. */
  reads(): Request[] {
    return [this.rotation(this.readList)];
  }

  writes(): Request[] {
    return [this.rotation(this.writeList)];
  }

  private readRoutes(): Route[] {
    const { targets } = this;
    const stopPages = Math.min(this.listPages, Math.ceil(targets.stopCount / PAGE_SIZE));
    const shearPages = Math.min(this.listPages, Math.ceil(targets.shearCount / PAGE_SIZE));
    return [
      this.route('day sheet', 'reads', (n) => {
        const day = targets.daySheets[n % targets.daySheets.length]!;
        return this.staff(day.sharpener, 'GET', `/route-days/${day.routeDayId}/sheet`);
      }),
      this.route('stops list', 'reads', (n) =>
        this.staff(this.office, 'GET', `/stops?${page(n, stopPages, STOP_SORTS)}`),
      ),
      this.route('shears list', 'reads', (n) =>
        this.staff(this.office, 'GET', `/shears?${page(n, shearPages, SHEAR_SORTS)}`),
      ),
      this.route('stop search', 'reads', (n) =>
        this.staff(this.office, 'GET', `/stops?q=${encodeURIComponent(pick(targets.stopWords, n))}`),
      ),
      this.route('shear search', 'reads', (n) =>
        this.staff(this.office, 'GET', `/shears?q=${encodeURIComponent(pick(targets.shearWords, n))}`),
      ),
      this.route('public stop page', 'reads', (n) => this.visitor('GET', `/public/stops/${pick(targets.stopIds, n)}`)),
      this.route('public stop search', 'reads', (n) =>
        this.visitor('GET', `/public/stops?q=${encodeURIComponent(pick(targets.stopWords, n).slice(0, 6))}`),
      ),
      this.route('public quote', 'reads', (n) =>
        this.visitor('POST', '/public/bookings/quote', { stopId: pick(targets.stopIds, n), items: items(n) }),
      ),
    ];
  }

  private writeRoutes(): Route[] {
    const lines = this.targets.benchLines;
    return [
      this.route('bench status step', 'writes', (n) => {
        const line = lines[n % lines.length]!;
        // Waiting and on the bench may follow each other any number of times, so the step never becomes illegal,
        // whatever order the connections reach a pair in.
        const benchStatus = Math.floor(n / lines.length) % 2 === 0 ? 'on-the-bench' : 'waiting';
        return this.staff(line.sharpener, 'PATCH', `/tickets/${line.ticketId}/lines/${line.lineId}`, { benchStatus });
      }),
      this.route('line note', 'writes', (n) => {
        const line = lines[(n * 7) % lines.length]!;
        const notes = `Load run note ${n}: tip checked, pivot set.`;
        return this.staff(line.sharpener, 'PATCH', `/tickets/${line.ticketId}/lines/${line.lineId}`, { notes });
      }),
      this.route('public booking (mail-in)', 'writes', (n) =>
        this.visitor('POST', '/public/bookings', {
          stopId: pick(this.targets.stopIds, n),
          items: items(n),
          routeDayId: null,
          mailIn: true,
          name: `Load Visitor ${n}`,
          email: `visitor-${n}@load.keenroute.test`,
          phone: '555-0100',
          notes: 'Sent by the load benchmark.',
          consent: true,
          idempotencyKey: randomUUID(),
        }),
      ),
    ];
  }

  /** One round of every route, one at a time, before the load: a route that cannot answer stops the run here. */
  async preflight(baseUrl: string): Promise<void> {
    for (const route of [...this.readList, ...this.writeList]) {
      const call = route.build();
      const response = await fetch(`${baseUrl}/api${call.path}`, {
        method: call.method,
        headers: call.headers,
        body: call.body === undefined ? undefined : JSON.stringify(call.body),
      });
      const text = await response.text();
      if (!response.ok)
        throw new Error(`${call.method} ${call.path} answered ${response.status}: ${text.slice(0, 300)}`);
    }
  }

  private route(name: string, kind: LoadKind, build: (n: number) => Call): Route {
    const record: RouteRecord = { name, kind, latencies: [], statuses: new Map(), failures: [] };
    this.records.set(name, record);
    let n = 0;
    return { record, build: () => build(n++) };
  }

  /**
   * One request that each connection sends over and over; every time it is built it takes the next route of the
   * list (shared by all connections), so the mix stays even however long the run and however slow one route is.
   */
  private rotation(routes: Route[]): Request {
    let next = 0;
    return {
      setupRequest: (request, context) => {
        const route = routes[next++ % routes.length]!;
        const call = route.build();
        const timing = context as Timing;
        timing.route = route.record;
        timing.path = `${call.method} ${call.path}`;
        // Built just before it is written to the connection (one request at a time per connection).
        timing.sentAt = performance.now();
        return {
          ...request,
          method: call.method,
          path: `/api${call.path}`,
          headers: call.headers,
          body: call.body === undefined ? undefined : JSON.stringify(call.body),
        };
      },
      onResponse: (status, body, context) => {
        const { route: record, sentAt, path } = context as Timing;
        if (!record || sentAt === undefined) return;
        record.latencies.push(performance.now() - sentAt);
        record.statuses.set(status, (record.statuses.get(status) ?? 0) + 1);
        if ((status < 200 || status > 299) && record.failures.length < KEPT_FAILURES) {
          record.failures.push(`${status} ${path ?? ''}: ${body.slice(0, 200)}`);
        }
      },
    };
  }

  private staff(email: string, method: Call['method'], path: string, body?: unknown): Call {
    const headers: Record<string, string> = { Authorization: this.sessions.header(email) };
    return { method, path, headers: body === undefined ? headers : { ...headers, ...json }, body };
  }

  private visitor(method: Call['method'], path: string, body?: unknown): Call {
    const headers: Record<string, string> = { 'X-Forwarded-For': visitorAddress() };
    return { method, path, headers: body === undefined ? headers : { ...headers, ...json }, body };
  }
}

const pick = <T>(list: readonly T[], n: number): T => list[n % list.length]!;

/** Page n of a list, walking the pages and the sort orders. */
function page(n: number, pages: number, sorts: readonly string[]): string {
  return new URLSearchParams({
    page: String((n % pages) + 1),
    pageSize: String(PAGE_SIZE),
    sort: pick(sorts, Math.floor(n / pages)),
    order: n % 2 === 0 ? 'asc' : 'desc',
  }).toString();
}

/** A groomer's list of shears by kind, varied from one request to the next. */
function items(n: number) {
  return [{ toolKind: pick(TOOL_KINDS, n), edgeType: pick(EDGE_TYPES, n >> 1), count: (n % 3) + 1 }];
}
