import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { pathToFileURL } from 'node:url';
import { parseArgs } from 'node:util';

/**
 * The local stand-in for a routing service's matrix endpoint of the usual `table` form:
 * `GET /table/v1/driving/{lon},{lat};{lon},{lat};...?annotations=duration,distance` answers
 * `{ code: 'Ok', durations: [[seconds]], distances: [[metres]] }`. It has no road network: the demo city's streets are
 * a grid, so it drives "around the block" (east-west plus north-south distance on a local plane) at a flat town speed.
 */

export interface RoutingOptions {
  /** 0 picks a free port. */
  port: number;
  host?: '127.0.0.1';
}

export interface Routing {
  readonly url: string;
  readonly port: number;
  stop(): Promise<void>;
}

/** The stand-in's town speed; any fixed figure does, it only has to differ from the great-circle estimate. */
export const STAND_IN_SPEED_KMH = 30;
const KM_PER_DEGREE_LAT = 111.32;
const MAX_POINTS = 500;
const USAGE = 'Try GET /table/v1/driving/-92.40,44.81;-92.41,44.82?annotations=duration,distance.';

/** Grid distance in km between two [lon, lat] points: north-south plus east-west on the local plane. */
export function gridKm(a: readonly [number, number], b: readonly [number, number]): number {
  const meanLat = ((a[1] + b[1]) / 2) * (Math.PI / 180);
  const north = Math.abs(a[1] - b[1]) * KM_PER_DEGREE_LAT;
  const east = Math.abs(a[0] - b[0]) * KM_PER_DEGREE_LAT * Math.cos(meanLat);
  return north + east;
}

function sendJson(response: http.ServerResponse, status: number, body: unknown): void {
  response.writeHead(status, { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' });
  response.end(JSON.stringify(body));
}

function parsePoints(text: string): [number, number][] | undefined {
  const points = decodeURIComponent(text)
    .split(';')
    .map((pair) => pair.split(',').map(Number));
  const ok = points.every(
    (p) => p.length === 2 && Math.abs(p[0]!) <= 180 && Math.abs(p[1]!) <= 90 && p.every(Number.isFinite),
  );
  return ok && points.length >= 1 && points.length <= MAX_POINTS ? (points as [number, number][]) : undefined;
}

function handle(request: http.IncomingMessage, response: http.ServerResponse): void {
  const url = new URL(request.url ?? '/', 'http://localhost');
  const match = /^\/table\/v1\/driving\/([^/]+)$/.exec(url.pathname);
  if (request.method !== 'GET' || !match) return sendJson(response, 400, { code: 'InvalidUrl', message: USAGE });
  const points = parsePoints(match[1]!);
  if (!points) {
    return sendJson(response, 400, {
      code: 'InvalidQuery',
      message: `Coordinates are lon,lat pairs joined by ";". ${USAGE}`,
    });
  }
  const annotations = (url.searchParams.get('annotations') ?? 'duration').split(',');
  const km = points.map((a) => points.map((b) => gridKm(a, b)));
  sendJson(response, 200, {
    code: 'Ok',
    ...(annotations.includes('duration')
      ? { durations: km.map((row) => row.map((d) => Math.round((d / STAND_IN_SPEED_KMH) * 3600 * 10) / 10)) }
      : {}),
    ...(annotations.includes('distance')
      ? { distances: km.map((row) => row.map((d) => Math.round(d * 10000) / 10)) }
      : {}),
  });
}

function listenError(error: NodeJS.ErrnoException, port: number): Error {
  return error.code === 'EADDRINUSE'
    ? new Error(`Port ${port} is taken: the routing stand-in could not start. Stop what holds it or pick another port.`)
    : error;
}

export async function startRouting(options: RoutingOptions): Promise<Routing> {
  const host = options.host ?? '127.0.0.1';
  const server = http.createServer(handle);
  await new Promise<void>((resolve, reject) => {
    server.once('error', (error) => reject(listenError(error, options.port)));
    server.listen(options.port, host, () => resolve());
  });
  server.on('error', (error) => console.error(`[routing] ${error.message}`));
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
  const { values } = parseArgs({ options: { port: { type: 'string', default: process.env.ROUTING_PORT ?? '1095' } } });
  const routing = await startRouting({ port: Number(values.port) });
  console.log(`Routing stand-in: ${routing.url}/table/v1/driving/{lon,lat;...} (Ctrl-C stops it).`);
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.once(signal, () => void routing.stop().then(() => process.exit(0)));
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  runStandalone().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
