import type { DataSource } from 'typeorm';
import type { Sessions } from './sessions';

/** The sharpeners whose days the run reads and whose benches it works: those with the most route days. */
const SHARPENERS = 8;
/** Route days per sharpener whose day sheets are read, the most recent first. */
const DAYS_PER_SHARPENER = 30;
/** Open tickets each sharpener has on their latest route day for the bench writes. */
const OPEN_TICKETS_PER_SHARPENER = 15;
const LINES_PER_TICKET = 3;

export interface DaySheetTarget {
  routeDayId: string;
  sharpener: string;
}

/** A pair on an open ticket, worked by the sharpener whose route day the ticket is on. */
export interface BenchLine {
  ticketId: string;
  lineId: string;
  sharpener: string;
}

export interface LoadTargets {
  sharpeners: string[];
  daySheets: DaySheetTarget[];
  /** Every stop in the registry, for the stop page of the public booking form. */
  stopIds: string[];
  stopCount: number;
  shearCount: number;
  /** Texts people type into the stop search: towns and street names. */
  stopWords: string[];
  /** Texts typed into the shear search: makes, and tag codes as read off a label. */
  shearWords: string[];
  benchLines: BenchLine[];
}

export async function findTargets(db: DataSource): Promise<LoadTargets> {
  const sharpeners = (
    await db.query<{ email: string }[]>(
      `SELECT u.email FROM route_days rd JOIN users u ON u.id = rd.sharpener_id
        WHERE u.role = 'sharpener' AND u.active
        GROUP BY u.email ORDER BY count(*) DESC, u.email LIMIT $1`,
      [SHARPENERS],
    )
  ).map((row) => row.email);
  if (sharpeners.length === 0) {
    throw new Error('This database has no route days: load the large dataset first (npm run reports:dataset).');
  }
  const daySheets = (
    await db.query<{ id: string; email: string }[]>(
      `SELECT id, email FROM (
         SELECT rd.id, u.email, row_number() OVER (PARTITION BY u.id ORDER BY rd.day DESC) AS n
           FROM route_days rd JOIN users u ON u.id = rd.sharpener_id
          WHERE u.email = ANY($1) AND EXISTS (SELECT 1 FROM route_day_stops s WHERE s.route_day_id = rd.id)
       ) recent WHERE n <= $2 ORDER BY n, email`,
      [sharpeners, DAYS_PER_SHARPENER],
    )
  ).map((row) => ({ routeDayId: row.id, sharpener: row.email }));
  const stopIds = (
    await db.query<{ id: string }[]>(
      'SELECT id FROM stops WHERE active AND latitude IS NOT NULL AND longitude IS NOT NULL ORDER BY name',
    )
  ).map((row) => row.id);
  const [counts] = await db.query<{ stops: number; shears: number }[]>(
    'SELECT (SELECT count(*)::int FROM stops) AS stops, (SELECT count(*)::int FROM shears) AS shears',
  );
  const stopWords = (
    await db.query<{ word: string }[]>(
      `SELECT word FROM (SELECT DISTINCT city AS word FROM stops
                         UNION SELECT DISTINCT regexp_replace(street, '^[0-9]+ ', '') FROM stops) words
        WHERE length(word) > 2 ORDER BY word LIMIT 40`,
    )
  ).map((row) => row.word);
  const shearWords = (
    await db.query<{ word: string }[]>(
      `(SELECT DISTINCT make AS word FROM shears WHERE make <> '' ORDER BY 1 LIMIT 20)
       UNION ALL (SELECT tag_code FROM shears ORDER BY md5(id::text) LIMIT 20)`,
    )
  ).map((row) => row.word);
  if (stopIds.length === 0 || stopWords.length === 0 || shearWords.length === 0) {
    throw new Error('This database has no stops or shears: load the large dataset first (npm run reports:dataset).');
  }
  return {
    sharpeners,
    daySheets,
    stopIds,
    stopCount: counts!.stops,
    shearCount: counts!.shears,
    stopWords,
    shearWords,
    benchLines: [],
  };
}

interface TicketBody {
  id: string;
  lines: { id: string }[];
}

/**
 * The open pairs the writes step through: each sharpener's open tickets on their latest route day, opened through
 * the API (as the sharpener, at the stop's customers, with their registered shears) when a run finds too few. Later
 * runs reuse them; a pair stays waiting or on the bench, so every write of the run is one the bench may make.
 */
export async function prepareBenchLines(
  db: DataSource,
  targets: LoadTargets,
  sessions: Sessions,
  baseUrl: string,
): Promise<BenchLine[]> {
  const call = async <T>(email: string, method: string, path: string, body: unknown): Promise<T> => {
    const response = await fetch(`${baseUrl}/api${path}`, {
      method,
      headers: { Authorization: sessions.header(email), 'Content-Type': 'application/json' },
      body: JSON.stringify(body),
    });
    const text = await response.text();
    if (!response.ok) throw new Error(`${method} ${path} answered ${response.status}: ${text.slice(0, 300)}`);
    return JSON.parse(text) as T;
  };
  const lines: BenchLine[] = [];
  for (const sharpener of targets.sharpeners) {
    const [day] = await db.query<{ id: string }[]>(
      `SELECT rd.id FROM route_days rd JOIN users u ON u.id = rd.sharpener_id
          WHERE u.email = $1 AND EXISTS (SELECT 1 FROM route_day_stops s WHERE s.route_day_id = rd.id)
          ORDER BY rd.day DESC LIMIT 1`,
      [sharpener],
    );
    if (!day) continue;
    const open = async () =>
      await db.query<{ ticket_id: string; line_id: string }[]>(
        `SELECT t.id AS ticket_id, l.id AS line_id FROM tickets t JOIN ticket_lines l ON l.ticket_id = t.id
            WHERE t.route_day_id = $1 AND t.status = 'open' AND l.bench_status IN ('waiting', 'on-the-bench')
            ORDER BY t.created_at, l.position`,
        [day.id],
      );
    const have = new Set((await open()).map((row) => row.ticket_id)).size;
    if (have < OPEN_TICKETS_PER_SHARPENER) {
      // Customers at the day's stops with shears on no open ticket yet: a ticket each, with up to three pairs.
      const customers = await db.query<{ customer_id: string; stop_id: string; shear_ids: string[] }[]>(
        `SELECT c.id AS customer_id, c.stop_id,
                  (array_agg(sh.id ORDER BY sh.tag_code))[1:$3] AS shear_ids
             FROM route_day_stops rds
             JOIN customers c ON c.stop_id = rds.stop_id AND c.active
             JOIN shears sh ON sh.customer_id = c.id AND sh.status = 'in-service'
            WHERE rds.route_day_id = $1
              AND NOT EXISTS (SELECT 1 FROM tickets t WHERE t.customer_id = c.id AND t.status = 'open')
              AND NOT EXISTS (SELECT 1 FROM ticket_lines l JOIN tickets t ON t.id = l.ticket_id
                               WHERE l.shear_id = sh.id AND t.status = 'open')
            GROUP BY c.id, c.stop_id ORDER BY c.id LIMIT $2`,
        [day.id, OPEN_TICKETS_PER_SHARPENER - have, LINES_PER_TICKET],
      );
      for (const customer of customers) {
        const ticket = await call<TicketBody>(sharpener, 'POST', '/tickets', {
          customerId: customer.customer_id,
          stopId: customer.stop_id,
          routeDayId: day.id,
          kind: 'visit',
          notes: 'Opened by the load benchmark.',
        });
        for (const shearId of customer.shear_ids) {
          await call<TicketBody>(sharpener, 'POST', `/tickets/${ticket.id}/lines`, { shearId });
        }
      }
    }
    for (const row of await open()) lines.push({ ticketId: row.ticket_id, lineId: row.line_id, sharpener });
  }
  if (lines.length === 0) throw new Error('No open ticket lines could be prepared for the bench writes.');
  return acrossTickets(lines);
}

/**
 * The pairs in the order the writes take them: the first pair of every ticket, then the second of every ticket, and
 * so on. Writes at the same moment then reach different tickets, as several sharpeners' benches would, instead of
 * queueing for one ticket's row lock.
 */
function acrossTickets(lines: readonly BenchLine[]): BenchLine[] {
  const rank = new Map<string, number>();
  const ranked = lines.map((line, order) => {
    const n = rank.get(line.ticketId) ?? 0;
    rank.set(line.ticketId, n + 1);
    return { line, n, order };
  });
  return ranked.sort((a, b) => a.n - b.n || a.order - b.order).map(({ line }) => line);
}
