import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { pathToFileURL } from 'node:url';
import { parseArgs } from 'node:util';
import { DEMO_ADDRESSES, type DemoAddress } from '../../server/src/database/seeds/demo-city.js';

/**
 * The local stand-in for an HTTP geocoder of the usual search form (`GET /search?q=...&format=json&limit=N`). It
 * knows only the invented demo city's addresses: a house number and street answer one place, a bare street (or any
 * query matching several) answers several, anything unknown answers []. Coordinates are strings, as such APIs send.
 */

export interface GeocoderOptions {
  /** 0 picks a free port. */
  port: number;
  host?: '127.0.0.1';
}

export interface Geocoder {
  readonly url: string;
  readonly port: number;
  stop(): Promise<void>;
}

export interface GeocoderPlace {
  place_id: number;
  lat: string;
  lon: string;
  display_name: string;
}

const DEFAULT_LIMIT = 10;
const MAX_LIMIT = 50;
const USAGE = 'Try GET /search?q=<address>&format=json&limit=N.';

// People write "Rd" as often as "Road"; the demo's streets use the long forms.
const ABBREVIATIONS: Readonly<Record<string, string>> = {
  st: 'street',
  rd: 'road',
  ave: 'avenue',
  av: 'avenue',
  ln: 'lane',
  dr: 'drive',
  blvd: 'boulevard',
  pl: 'place',
};

function words(text: string): string[] {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, ' ')
    .split(' ')
    .filter((word) => word !== '')
    .map((word) => ABBREVIATIONS[word] ?? word);
}

interface Known {
  address: DemoAddress;
  houseNumber: string;
  streetWords: string[];
  place: GeocoderPlace;
}

const KNOWN: readonly Known[] = DEMO_ADDRESSES.map((address, index) => {
  const [houseNumber = '', ...street] = words(address.street);
  return {
    address,
    houseNumber,
    streetWords: street,
    place: {
      place_id: index + 1,
      lat: String(address.latitude),
      lon: String(address.longitude),
      display_name: `${address.street}, ${address.city}, ${address.region} ${address.postalCode}, ${address.country}`,
    },
  };
});

// City, region, postcode and country words say nothing about which address is meant in a one-city demo.
const PLACE_WORDS = new Set(
  DEMO_ADDRESSES.flatMap((address) =>
    words(`${address.city} ${address.region} ${address.postalCode} ${address.country}`),
  ),
);

/** The demo places a free-text address matches, in the demo list's order. */
export function matchDemoAddresses(query: string): GeocoderPlace[] {
  const meaningful = words(query).filter((word) => !PLACE_WORDS.has(word));
  const numbers = meaningful.filter((word) => /^\d+$/.test(word));
  const streetWords = meaningful.filter((word) => !/^\d+$/.test(word));
  if (streetWords.length === 0 || numbers.length > 1) return [];
  return KNOWN.filter(
    (known) =>
      streetWords.every((word) => known.streetWords.includes(word)) &&
      (numbers.length === 0 || numbers[0] === known.houseNumber),
  ).map((known) => known.place);
}

function sendJson(response: http.ServerResponse, status: number, body: unknown): void {
  response.writeHead(status, { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' });
  response.end(JSON.stringify(body));
}

function handle(request: http.IncomingMessage, response: http.ServerResponse): void {
  const url = new URL(request.url ?? '/', 'http://localhost');
  if (request.method !== 'GET' || url.pathname !== '/search') {
    return sendJson(response, 400, { error: `Unknown request. ${USAGE}` });
  }
  const q = url.searchParams.get('q')?.trim() ?? '';
  if (q === '') return sendJson(response, 400, { error: `Missing q (the address to look up). ${USAGE}` });
  const format = url.searchParams.get('format') ?? 'json';
  if (format !== 'json' && format !== 'jsonv2') {
    return sendJson(response, 400, { error: `This stand-in answers format=json only. ${USAGE}` });
  }
  const rawLimit = url.searchParams.get('limit');
  const limit = rawLimit === null ? DEFAULT_LIMIT : Number(rawLimit);
  if (!Number.isInteger(limit) || limit < 1 || limit > MAX_LIMIT) {
    return sendJson(response, 400, { error: `limit is a whole number from 1 to ${MAX_LIMIT}. ${USAGE}` });
  }
  sendJson(response, 200, matchDemoAddresses(q).slice(0, limit));
}

function listenError(error: NodeJS.ErrnoException, port: number): Error {
  if (error.code === 'EADDRINUSE') {
    return new Error(
      `Port ${port} on 127.0.0.1 is already taken, so the geocoder stand-in cannot start there.\n` +
        `  See what holds it:  ss -ltnp 'sport = :${port}'\n` +
        `  Stop that program, or choose another port (GEOCODER_PORT).`,
    );
  }
  return error;
}

export async function startGeocoder(options: GeocoderOptions): Promise<Geocoder> {
  const host = options.host ?? '127.0.0.1';
  const server = http.createServer(handle);
  await new Promise<void>((resolve, reject) => {
    server.once('error', (error) => reject(listenError(error, options.port)));
    server.listen(options.port, host, () => resolve());
  });
  server.on('error', (error) => console.error(`[geocoder] ${error.message}`));
  const port = (server.address() as AddressInfo).port;
  let stopping: Promise<void> | undefined;
  return {
    port,
    url: `http://${host}:${port}`,
    stop() {
      stopping ??= new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
      return stopping;
    },
  };
}

async function runStandalone(): Promise<void> {
  const { values } = parseArgs({
    options: { port: { type: 'string', default: process.env.GEOCODER_PORT ?? '1090' } },
  });
  const geocoder = await startGeocoder({ port: Number(values.port) });
  console.log(`Geocoder stand-in: ${geocoder.url}/search?q=...&format=json (Ctrl-C stops it).`);
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.once(signal, () => void geocoder.stop().then(() => process.exit(0)));
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  runStandalone().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
