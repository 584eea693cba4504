import assert from 'node:assert/strict';
import { after, before, describe, it } from 'node:test';
import { DEMO_ADDRESSES } from '../../server/src/database/seeds/demo-city.js';
import { startGeocoder, type Geocoder, type GeocoderPlace } from './geocoder.js';

void describe('geocoder stand-in', () => {
  let geocoder: Geocoder;
  const search = (q: string, extra = '&format=json') =>
    fetch(`${geocoder.url}/search?q=${encodeURIComponent(q)}${extra}`);
  const places = async (q: string, extra?: string): Promise<GeocoderPlace[]> => {
    const response = await search(q, extra);
    assert.equal(response.status, 200);
    assert.match(response.headers.get('content-type') ?? '', /application\/json/);
    return (await response.json()) as GeocoderPlace[];
  };
  const first = DEMO_ADDRESSES[0]!;

  before(async () => {
    geocoder = await startGeocoder({ port: 0, host: '127.0.0.1' });
  });
  after(() => geocoder.stop());

  void it('reports the real port it picked', () => {
    assert.ok(geocoder.port > 0);
    assert.equal(geocoder.url, `http://127.0.0.1:${geocoder.port}`);
  });

  void it('answers one place, with string coordinates, for a demo address written in full', async () => {
    const full = `${first.street}, ${first.city}, ${first.region} ${first.postalCode}, ${first.country}`;
    const found = await places(full);
    assert.equal(found.length, 1);
    assert.deepEqual(
      { lat: found[0]!.lat, lon: found[0]!.lon, display_name: found[0]!.display_name },
      { lat: String(first.latitude), lon: String(first.longitude), display_name: full },
    );
    assert.equal(typeof found[0]!.lat, 'string');
  });

  void it('ignores case, punctuation, city words and common street abbreviations', async () => {
    const [number, ...street] = first.street.split(' ');
    const shouted = `  ${number}  ${street.join(' ').toUpperCase()}!!! ${first.city.toLowerCase()}`;
    assert.deepEqual(
      (await places(shouted)).map((place) => place.display_name.split(',')[0]),
      [first.street],
    );
    const road = DEMO_ADDRESSES.find((address) => address.street.endsWith(' Road'))!;
    const abbreviated = road.street.replace(/ Road$/, ' Rd.');
    assert.equal((await places(abbreviated)).length, 1);
  });

  void it('answers every address on a street when the house number is missing, limited by limit', async () => {
    const streetName = first.street.replace(/^\d+ /, '');
    const onStreet = DEMO_ADDRESSES.filter((address) => address.street.endsWith(` ${streetName}`));
    assert.ok(onStreet.length > 1);
    const all = await places(`${streetName}, ${first.city}`);
    assert.deepEqual(
      all.map((place) => place.lat),
      onStreet.map((address) => String(address.latitude)),
    );
    assert.equal((await places(streetName, '&format=json&limit=2')).length, 2);
  });

  void it('answers several places when words match more than one street', async () => {
    const roads = DEMO_ADDRESSES.filter((address) => address.street.endsWith(' Road'));
    assert.equal((await places('Road')).length, Math.min(roads.length, 10));
  });

  void it('answers [] for an unknown house number, street or town', async () => {
    assert.deepEqual(await places(`1 ${first.street.replace(/^\d+ /, '')}`), []);
    assert.deepEqual(await places('12 Nowhere Street'), []);
    assert.deepEqual(await places(`${first.street}, Springfield`), []);
    assert.deepEqual(await places(first.city), []);
  });

  void it('answers 400 for a missing q, a bad limit or format, another path or method', async () => {
    assert.equal((await fetch(`${geocoder.url}/search?format=json`)).status, 400);
    assert.equal((await search('   ')).status, 400);
    assert.equal((await search(first.street, '&format=json&limit=0')).status, 400);
    assert.equal((await search(first.street, '&format=xml')).status, 400);
    const wrongPath = await fetch(`${geocoder.url}/reverse?lat=1&lon=2`);
    assert.equal(wrongPath.status, 400);
    assert.match(((await wrongPath.json()) as { error: string }).error, /GET \/search\?q=/);
    assert.equal((await fetch(`${geocoder.url}/search?q=x`, { method: 'POST' })).status, 400);
  });

  void it('refuses a port already taken with a message that says what to do', async () => {
    await assert.rejects(
      startGeocoder({ port: geocoder.port }),
      /Port \d+ on 127\.0\.0\.1 is already taken[\s\S]*GEOCODER_PORT/,
    );
  });
});
