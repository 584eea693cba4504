import type { ConfigService } from '@nestjs/config';
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import type { Repository } from 'typeorm';
import type { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import type { AppConfig } from '../config/environment';
import type { ShearPhoto } from './entities/shear-photo.entity';
import { photoPaths, ShearPhotosService } from './shear-photos.service';

const sharpener: Actor = { id: 'sharpener-1', email: 's@x.test', name: 'S', role: 'sharpener' };
const SHEAR_ID = '0b6f3f1e-4d7c-4a55-9a43-0f5d2d0c1a11';

describe('photoPaths', () => {
  it('names both files after the photo id, with the extension of the detected type', () => {
    expect(photoPaths('/data/photos', SHEAR_ID, 'p1', 'image/jpeg')).toEqual({
      folder: `/data/photos/${SHEAR_ID}`,
      original: `/data/photos/${SHEAR_ID}/p1.jpg`,
      thumbnail: `/data/photos/${SHEAR_ID}/p1.thumb.webp`,
    });
  });
});

describe('ShearPhotosService.add', () => {
  let dataDir: string;
  let png: Buffer;

  beforeAll(async () => {
    png = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#1d5c63' } })
      .png()
      .toBuffer();
  });
  beforeEach(async () => {
    dataDir = await mkdtemp(join(tmpdir(), 'kr-photos-'));
  });
  afterEach(async () => {
    await rm(dataDir, { recursive: true, force: true });
  });

  function setUp(save: (row: Partial<ShearPhoto>) => Promise<unknown>) {
    const photos = { create: (row: Partial<ShearPhoto>) => row, save } as unknown as Repository<ShearPhoto>;
    const access = { requireShear: () => Promise.resolve({ id: SHEAR_ID }) } as unknown as RegistryAccess;
    const config = { get: () => dataDir } as unknown as ConfigService<AppConfig, true>;
    return new ShearPhotosService(photos, access, config);
  }

  it('writes the original and a thumbnail under DATA_DIR/photos/<shear id>/', async () => {
    const sut = setUp((row) => Promise.resolve({ ...row, createdAt: new Date() }));
    const photo = await sut.add(sharpener, SHEAR_ID, { buffer: png });
    expect(photo).toMatchObject({ contentType: 'image/png', width: 40, height: 30, byteSize: png.length });
    expect((await readdir(join(dataDir, 'photos', SHEAR_ID))).sort()).toEqual([
      `${photo.id}.png`,
      `${photo.id}.thumb.webp`,
    ]);
  });

  it('removes the files again when the row cannot be saved', async () => {
    const sut = setUp(() => Promise.reject(new Error('database down')));
    await expect(sut.add(sharpener, SHEAR_ID, { buffer: png })).rejects.toThrow('database down');
    expect(await readdir(join(dataDir, 'photos', SHEAR_ID))).toEqual([]);
  });

  it('asks for a photo when none was sent', async () => {
    const sut = setUp(() => Promise.resolve({}));
    await expect(sut.add(sharpener, SHEAR_ID, undefined)).rejects.toMatchObject({
      code: 'invalid_input',
      fields: { photo: [expect.stringMatching(/Attach a photo/)] },
    });
  });
});
