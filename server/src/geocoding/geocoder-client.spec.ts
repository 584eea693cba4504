import { Logger } from '@nestjs/common';
import type { ConfigService } from '@nestjs/config';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { AppConfig } from '../config/environment';
import { GeocoderClient } from './geocoder-client';

/** A quicker client so the slow-geocoder case does not hold the suite for 3 s. */
class QuickGeocoderClient extends GeocoderClient {
  protected override readonly timeoutMs = 200;
}

const configWith = (url: string | undefined) =>
  ({ get: (key: string) => (key === 'GEOCODER_URL' ? url : undefined) }) as unknown as ConfigService<AppConfig, true>;

describe('GeocoderClient', () => {
  let server: http.Server;
  let baseUrl: string;
  let answer: (url: URL, response: http.ServerResponse) => void;
  const seen: URL[] = [];
  const json = (response: http.ServerResponse, status: number, body: unknown) =>
    response.writeHead(status, { 'content-type': 'application/json' }).end(JSON.stringify(body));

  beforeAll(async () => {
    // The client logs each failed look-up; here they are on purpose.
    Logger.overrideLogger(false);
    server = http.createServer((request, response) => {
      const url = new URL(request.url ?? '/', 'http://localhost');
      seen.push(url);
      answer(url, response);
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    server.closeAllConnections();
    await new Promise((resolve) => server.close(resolve));
  });
  beforeEach(() => {
    seen.length = 0;
  });

  it('asks the search form and reads one place, turning string coordinates into numbers', async () => {
    answer = (_url, response) =>
      json(response, 200, [{ lat: '44.8243', lon: '-92.417', display_name: '104 Alder Row' }]);
    const sut = new QuickGeocoderClient(configWith(`${baseUrl}/`));
    await expect(sut.search('104 Alder Row, Larkhaven')).resolves.toEqual({
      status: 'found',
      message: null,
      candidates: [{ label: '104 Alder Row', latitude: 44.8243, longitude: -92.417 }],
    });
    expect(seen[0]?.pathname).toBe('/search');
    expect(Object.fromEntries(seen[0]!.searchParams)).toEqual({
      q: '104 Alder Row, Larkhaven',
      format: 'json',
      limit: '5',
    });
  });

  it('keeps a path prefix in GEOCODER_URL', async () => {
    answer = (_url, response) => json(response, 200, []);
    await new QuickGeocoderClient(configWith(`${baseUrl}/geo`)).search('x y z');
    expect(seen[0]?.pathname).toBe('/geo/search');
  });

  it('calls several usable places ambiguous and drops places without usable coordinates', async () => {
    answer = (_url, response) =>
      json(response, 200, [
        { lat: '44.1', lon: '-92.1', display_name: 'A' },
        { lat: 'north', lon: '-92.1', display_name: 'broken' },
        { lat: '95', lon: '0', display_name: 'off the globe' },
        { lat: 44.2, lon: -92.2 },
      ]);
    const result = await new QuickGeocoderClient(configWith(baseUrl)).search('Alder Row');
    expect(result.status).toBe('ambiguous');
    expect(result.message).toMatch(/matches 2 places/);
    expect(result.candidates).toEqual([
      { label: 'A', latitude: 44.1, longitude: -92.1 },
      { label: '44.2, -92.2', latitude: 44.2, longitude: -92.2 },
    ]);
  });

  it('fails with a message to place the pin when nothing is found', async () => {
    answer = (_url, response) => json(response, 200, []);
    await expect(new QuickGeocoderClient(configWith(baseUrl)).search('1 Nowhere')).resolves.toEqual({
      status: 'failed',
      message: expect.stringMatching(/No place was found[\s\S]*Enter coordinates/),
      candidates: [],
    });
  });

  it.each([
    ['an HTTP error', (response: http.ServerResponse) => json(response, 503, { error: 'busy' }), /HTTP 503/],
    ['a body that is not a list', (response: http.ServerResponse) => json(response, 200, { hits: [] }), /cannot read/],
    [
      'a body that is not JSON',
      (response: http.ServerResponse) => response.writeHead(200).end('<html>'),
      /could not be reached/,
    ],
    ['no answer in time', () => undefined, /did not answer within 0.2 s/],
  ])('never throws on %s: it fails with a message', async (_what, reply, message) => {
    answer = (_url, response) => reply(response);
    const result = await new QuickGeocoderClient(configWith(baseUrl)).search('104 Alder Row');
    expect(result).toEqual({ status: 'failed', message: expect.stringMatching(message), candidates: [] });
  });

  it('fails without asking anyone when the geocoder is down or not set up', async () => {
    const closed = http.createServer();
    await new Promise<void>((resolve) => closed.listen(0, '127.0.0.1', resolve));
    const closedUrl = `http://127.0.0.1:${(closed.address() as AddressInfo).port}`;
    await new Promise((resolve) => closed.close(resolve));
    const down = await new GeocoderClient(configWith(closedUrl)).search('104 Alder Row');
    expect(down).toMatchObject({ status: 'failed', message: expect.stringMatching(/could not be reached/) });
    const unset = await new GeocoderClient(configWith(undefined)).search('104 Alder Row');
    expect(unset).toMatchObject({ status: 'failed', message: expect.stringMatching(/No geocoder is set up/) });
  });
});
