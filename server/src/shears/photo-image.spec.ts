import sharp from 'sharp';
import { inspectPhoto, makeThumbnail, NOT_AN_IMAGE, TOO_MANY_PIXELS } from './photo-image';

const solid = (width: number, height: number) =>
  sharp({ create: { width, height, channels: 3, background: { r: 192, g: 138, b: 45 } } });

describe('inspectPhoto', () => {
  it('reads the format from the bytes and the size as shown', async () => {
    await expect(inspectPhoto(await solid(64, 48).png().toBuffer())).resolves.toEqual({
      contentType: 'image/png',
      width: 64,
      height: 48,
    });
    await expect(inspectPhoto(await solid(64, 48).webp().toBuffer())).resolves.toMatchObject({
      contentType: 'image/webp',
    });
    const sideways = await solid(64, 48).jpeg().withMetadata({ orientation: 8 }).toBuffer();
    await expect(inspectPhoto(sideways)).resolves.toEqual({ contentType: 'image/jpeg', width: 48, height: 64 });
  });

  it('refuses other formats and non-images with the same message on the photo field', async () => {
    for (const bytes of [await solid(8, 8).gif().toBuffer(), await solid(8, 8).tiff().toBuffer(), Buffer.from('hi')]) {
      await expect(inspectPhoto(bytes)).rejects.toMatchObject({
        code: 'invalid_input',
        message: NOT_AN_IMAGE,
        fields: { photo: [NOT_AN_IMAGE] },
      });
    }
  });

  it('refuses a decompression bomb by its pixel count', async () => {
    const bomb = await solid(7000, 6000).png({ compressionLevel: 9 }).toBuffer();
    await expect(inspectPhoto(bomb)).rejects.toMatchObject({ message: TOO_MANY_PIXELS });
  });
});

describe('makeThumbnail', () => {
  it('makes an upright WebP inside 320 x 320 with no metadata', async () => {
    const photo = await solid(800, 400)
      .jpeg()
      .withMetadata({ orientation: 6 })
      .withExif({ IFD0: { Make: 'Demo Camera' } })
      .toBuffer();
    const metadata = await sharp(await makeThumbnail(photo)).metadata();
    expect(metadata).toMatchObject({ format: 'webp', width: 160, height: 320 });
    expect(metadata.exif).toBeUndefined();
    expect(metadata.orientation).toBeUndefined();
  });

  it('does not enlarge a small photo', async () => {
    const metadata = await sharp(await makeThumbnail(await solid(100, 50).png().toBuffer())).metadata();
    expect(metadata).toMatchObject({ width: 100, height: 50 });
  });
});
