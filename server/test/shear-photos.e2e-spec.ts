import type { INestApplication } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import { existsSync } from 'node:fs';
import { readdir, readFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import sharp from 'sharp';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { ShearPhoto } from '../src/shears/entities/shear-photo.entity';
import { Stop } from '../src/stops/entities/stop.entity';
import { createTestApp, createUser, signIn } from './utils/test-app';
import { binary } from './utils/binary';

const solid = (width: number, height: number) =>
  sharp({ create: { width, height, channels: 3, background: { r: 29, g: 92, b: 99 } } });

describe('shear photos (e2e)', () => {
  let app: INestApplication<App>;
  const http = () => request(app.getHttpServer());
  const tokens: Record<string, string> = {};
  const as = (who: string) => ({ Authorization: `Bearer ${tokens[who]}` });
  const tag = randomUUID().slice(0, 6);
  const ids: Record<string, string> = {};
  const photosRoot = resolve(process.env.DATA_DIR ?? '', 'photos');
  let png: Buffer;
  let jpeg: Buffer;

  const upload = (shearId: string, body: Buffer, filename: string, who = 'office', contentType = 'image/png') =>
    http().post(`/api/shears/${shearId}/photos`).set(as(who)).attach('photo', body, { filename, contentType });
  const fetch = (path: string, who: string) => http().get(path).set(as(who)).buffer(true).parse(binary);

  beforeAll(async () => {
    app = await createTestApp();
    const people = {
      office: await createUser(app, 'office'),
      sharpener: await createUser(app, 'sharpener'),
      otherSharpener: await createUser(app, 'sharpener'),
      client: await createUser(app, 'client'),
      otherClient: await createUser(app, 'client'),
    };
    for (const [who, user] of Object.entries(people)) {
      tokens[who] = (await signIn(app, user.email)).token;
      ids[who] = user.id;
    }
    const stops = app.get(DataSource).getRepository(Stop);
    const stop = (name: string, assignedSharpenerId: string | null) =>
      stops.save(
        stops.create({
          name: `${name} ${tag}`,
          kind: 'salon',
          street: '1 Mill Rd',
          city: 'Demo City',
          cadenceWeeks: 8,
          assignedSharpenerId,
        }),
      );
    const stopA = await stop('Photo Salon', people.sharpener.id);
    const stopB = await stop('Other Salon', null);
    for (const [key, user, stopId] of [
      ['mine', people.client, stopA.id],
      ['theirs', people.otherClient, stopB.id],
    ] as const) {
      const customer = await http()
        .post('/api/customers')
        .set(as('office'))
        .send({ name: `Photo ${key} ${tag}`, stopId, userId: user.id })
        .expect(201);
      const shear = await http()
        .post('/api/shears')
        .set(as('office'))
        .send({ customerId: customer.body.id, lengthIn: 6, edgeType: 'convex', toolKind: 'straight' })
        .expect(201);
      ids[key] = shear.body.id as string;
    }
    png = await solid(640, 480).png().toBuffer();
    // A phone photo lying on its side: stored 400 x 300, shown 300 x 400 (EXIF orientation 6), with a camera tag.
    jpeg = await solid(400, 300)
      .jpeg()
      .withMetadata({ orientation: 6 })
      .withExif({ IFD0: { Make: 'Demo Camera', Copyright: 'Invented for tests' } })
      .toBuffer();
  });
  afterAll(async () => {
    await app.close();
  });

  it('stores a PNG under a server-made name and serves it back with its type and cache headers', async () => {
    const response = await upload(ids.mine!, png, 'shear.png').expect(201);
    expect(response.body).toEqual({
      id: expect.any(String),
      contentType: 'image/png',
      width: 640,
      height: 480,
      byteSize: png.length,
      createdAt: expect.any(String),
    });
    const photoId = response.body.id as string;
    const files = (await readdir(join(photosRoot, ids.mine!))).filter((name) => name.startsWith(photoId));
    expect(files.sort()).toEqual([`${photoId}.png`, `${photoId}.thumb.webp`]);

    const original = await fetch(`/api/shears/${ids.mine}/photos/${photoId}`, 'client').expect(200);
    expect(original.headers['content-type']).toBe('image/png');
    expect(original.headers['cache-control']).toBe('private, max-age=3600');
    expect(original.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(original.body as Buffer, png)).toBe(0);

    const thumbnail = await fetch(`/api/shears/${ids.mine}/photos/${photoId}/thumbnail`, 'sharpener').expect(200);
    expect(thumbnail.headers['content-type']).toBe('image/webp');
    expect(thumbnail.headers['cache-control']).toBe('private, max-age=3600');
    expect(await sharp(thumbnail.body as Buffer).metadata()).toMatchObject({ format: 'webp', width: 320, height: 240 });

    const detail = await http().get(`/api/shears/${ids.mine}`).set(as('client')).expect(200);
    expect(detail.body.photoCount).toBeGreaterThanOrEqual(1);
    expect(detail.body.photos).toContainEqual(response.body);
  });

  it('turns a JPEG upright by its EXIF orientation and strips the metadata from the original and the thumbnail', async () => {
    const response = await upload(ids.mine!, jpeg, 'IMG_0001.JPG', 'sharpener', 'image/jpeg').expect(201);
    expect(response.body).toMatchObject({ contentType: 'image/jpeg', width: 300, height: 400 });
    expect(existsSync(join(photosRoot, ids.mine!, `${response.body.id}.jpg`))).toBe(true);
    const thumbnail = await fetch(`/api/shears/${ids.mine}/photos/${response.body.id}/thumbnail`, 'office').expect(200);
    expect(thumbnail.headers['content-type']).toBe('image/webp');
    const metadata = await sharp(thumbnail.body as Buffer).metadata();
    expect(metadata).toMatchObject({ format: 'webp', width: 240, height: 320 });
    expect(metadata.exif).toBeUndefined();
    expect(metadata.orientation).toBeUndefined();
    const original = await fetch(`/api/shears/${ids.mine}/photos/${response.body.id}`, 'office').expect(200);
    expect(original.headers['content-type']).toBe('image/jpeg');
    expect(original.body.length).toBe(response.body.byteSize);
    const kept = await sharp(original.body as Buffer).metadata();
    expect(kept).toMatchObject({ format: 'jpeg', width: 300, height: 400 });
    expect(kept.exif).toBeUndefined();
    expect(kept.orientation).toBeUndefined();
  });

  it('refuses what is not a JPEG, PNG or WebP, whatever the name and declared type say', async () => {
    const text = Buffer.from('this is a text file pretending to be a photo\n');
    const renamed = await upload(ids.mine!, text, 'holiday.jpg', 'office', 'image/jpeg').expect(400);
    expect(renamed.body.message).toBe('The file is not a JPEG, PNG or WebP image.');
    expect(renamed.body.fields).toEqual({ photo: ['The file is not a JPEG, PNG or WebP image.'] });
    const gif = await solid(20, 20).gif().toBuffer();
    const asPng = await upload(ids.mine!, gif, 'looks-fine.png', 'office', 'image/png').expect(400);
    expect(asPng.body.message).toBe('The file is not a JPEG, PNG or WebP image.');
    const svg = Buffer.from(
      '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script></svg>',
    );
    await upload(ids.mine!, svg, 'x.png', 'office', 'image/png').expect(400);
    const truncated = png.subarray(0, 100);
    await upload(ids.mine!, truncated, 'cut.png').expect(400);
  });

  it('refuses an image with too many pixels, and a missing file', async () => {
    const huge = await solid(8000, 6000).png({ compressionLevel: 9 }).toBuffer();
    const response = await upload(ids.mine!, huge, 'bomb.png').expect(400);
    expect(response.body.message).toMatch(/at most 40 megapixels/);
    const none = await http().post(`/api/shears/${ids.mine}/photos`).set(as('office')).field('note', 'x').expect(400);
    expect(none.body.message).toEqual(expect.any(String));
    const empty = await http().post(`/api/shears/${ids.mine}/photos`).set(as('office')).expect(400);
    expect(empty.body.fields.photo[0]).toMatch(/Attach a photo/);
  });

  it('answers a file over 10 MB with 413 and a clear message', async () => {
    const big = Buffer.alloc(11 * 1024 * 1024, 7);
    const response = await upload(ids.mine!, big, 'big.png').expect(413);
    expect(response.body.message).toBe('The photo is larger than 10 MB. Send a smaller photo.');
  });

  it('never lets an upload name reach the disk or the response', async () => {
    const before = new Set(await readdir(photosRoot));
    const stored: string[] = [];
    const accept = async (response: request.Response) => {
      expect(response.status).toBe(201);
      expect(JSON.stringify(response.body)).not.toMatch(/passwd|boot|etc|\\u0000|a\.png/);
      const file = join(photosRoot, ids.theirs!, `${response.body.id}.png`);
      expect(await readFile(file)).toEqual(png);
      stored.push(response.body.id as string);
    };
    for (const filename of ['../../etc/passwd.png', '..\\..\\boot.ini.png', '/etc/passwd.png']) {
      await accept(await upload(ids.theirs!, png, filename));
    }
    // A NUL in a part header is refused by the multipart parser; one sent encoded (RFC 5987) gets through to us.
    const raw = await upload(ids.theirs!, png, 'a\u0000.png');
    expect(raw.status).toBe(400);
    const boundary = `----kr${randomUUID()}`;
    const body = Buffer.concat([
      Buffer.from(
        `--${boundary}\r\nContent-Disposition: form-data; name="photo"; filename*=UTF-8''a%00.png%00.sh\r\n` +
          'Content-Type: image/png\r\n\r\n',
      ),
      png,
      Buffer.from(`\r\n--${boundary}--\r\n`),
    ]);
    await accept(
      await http()
        .post(`/api/shears/${ids.theirs}/photos`)
        .set(as('office'))
        .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
        .send(body),
    );

    const names = await readdir(join(photosRoot, ids.theirs!));
    expect(names.every((name) => /^[0-9a-f-]{36}(\.png|\.jpg|\.webp|\.thumb\.webp)$/.test(name))).toBe(true);
    for (const id of stored) expect(names).toEqual(expect.arrayContaining([`${id}.png`, `${id}.thumb.webp`]));
    expect(existsSync(join(photosRoot, 'etc'))).toBe(false);
    expect(existsSync(resolve(photosRoot, '..', '..', 'etc', 'passwd.png'))).toBe(false);
    const after = (await readdir(photosRoot)).filter((name) => !before.has(name));
    expect(after.every((name) => name === ids.theirs)).toBe(true);
  });

  describe('who may see, add and remove photos', () => {
    let theirPhoto: string;
    let myPhoto: string;

    beforeAll(async () => {
      theirPhoto = (await upload(ids.theirs!, png, 'p.png').expect(201)).body.id as string;
      myPhoto = (await upload(ids.mine!, png, 'p.png').expect(201)).body.id as string;
    });

    it('answers 401 without a token', async () => {
      await http().get(`/api/shears/${ids.mine}/photos/${myPhoto}`).expect(401);
      await http().post(`/api/shears/${ids.mine}/photos`).attach('photo', png, 'p.png').expect(401);
    });

    it("gives a client of another customer 404 for the photo, its thumbnail and its shear's list entry", async () => {
      for (const path of [
        `/api/shears/${ids.theirs}/photos/${theirPhoto}`,
        `/api/shears/${ids.theirs}/photos/${theirPhoto}/thumbnail`,
        // Their photo under my shear's id: the photo must belong to the shear named.
        `/api/shears/${ids.mine}/photos/${theirPhoto}`,
      ]) {
        const response = await fetch(path, 'client').expect(404);
        expect(response.headers['content-type']).toMatch(/json/);
      }
      await fetch(`/api/shears/${ids.theirs}/photos/${theirPhoto}`, 'otherClient').expect(200);
      await fetch(`/api/shears/${ids.mine}/photos/${myPhoto}/thumbnail`, 'client').expect(200);
    });

    it('lets a sharpener add photos only to shears at their stops, and clients not at all', async () => {
      await upload(ids.theirs!, png, 'p.png', 'sharpener').expect(404);
      await upload(ids.mine!, png, 'p.png', 'otherSharpener').expect(404);
      await fetch(`/api/shears/${ids.mine}/photos/${myPhoto}`, 'otherSharpener').expect(404);
      await upload(ids.mine!, png, 'p.png', 'client').expect(403);
    });

    it('lets only owner and office delete, removing the files and the row', async () => {
      const photo = (await upload(ids.mine!, png, 'gone.png').expect(201)).body.id as string;
      for (const who of ['sharpener', 'client']) {
        await http().delete(`/api/shears/${ids.mine}/photos/${photo}`).set(as(who)).expect(403);
      }
      await http().delete(`/api/shears/${ids.theirs}/photos/${photo}`).set(as('office')).expect(404);
      await http().delete(`/api/shears/${ids.mine}/photos/${photo}`).set(as('office')).expect(204);
      expect(existsSync(join(photosRoot, ids.mine!, `${photo}.png`))).toBe(false);
      expect(existsSync(join(photosRoot, ids.mine!, `${photo}.thumb.webp`))).toBe(false);
      expect(await app.get(DataSource).getRepository(ShearPhoto).findOneBy({ id: photo })).toBeNull();
      await fetch(`/api/shears/${ids.mine}/photos/${photo}`, 'office').expect(404);
    });
  });
});
