/** What the load benchmark reads from its environment, checked once, with the variable's name in every refusal. */
export interface LoadSettings {
  baseUrl: string;
  databaseUrl: string;
  durationSeconds: number;
  connections: number;
  /** Of `connections`, the ones that send writes (the rest read). */
  writeConnections: number;
  /**
   * How many pages (25 rows) of the stops and shears lists are walked, in several sort orders both ways: people page
   * through a screen or two and search for the rest.
   */
  listPages: number;
  /**
   * Requests per second each connection sends at most; 0 (the default) sends the next as soon as the last is
   * answered, so the connections are always that many requests in flight.
   */
  connectionRate: number;
}

function whole(name: string, fallback: number, min: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < min) throw new Error(`${name}=${raw}: give a whole number from ${min}.`);
  return value;
}

export function loadSettings(): LoadSettings {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) {
    throw new Error(
      'Set DATABASE_URL to the database of the running server (for its connection count and the ids to ask for).',
    );
  }
  const connections = whole('CONNECTIONS', 100, 2);
  // A fifth of the connections write by default: a route day is mostly looking things up, with a bench to keep up.
  const writeConnections = whole('WRITE_CONNECTIONS', Math.max(1, Math.round(connections / 5)), 1);
  if (writeConnections >= connections) {
    throw new Error(
      `WRITE_CONNECTIONS=${writeConnections} leaves no reading connection of CONNECTIONS=${connections}.`,
    );
  }
  return {
    baseUrl: (process.env.BASE_URL ?? 'http://127.0.0.1:3000').replace(/\/+$/, ''),
    databaseUrl,
    durationSeconds: whole('DURATION', 60, 1),
    connections,
    writeConnections,
    listPages: whole('LIST_PAGES', 20, 1),
    connectionRate: whole('CONNECTION_RATE', 0, 0),
  };
}
