import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { Repository } from 'typeorm';
import { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import { toShearPhoto, type ShearPhotoDto } from './dto/shear-response.dto';
import { ShearPhoto } from './entities/shear-photo.entity';
import { cleanOriginal, inspectPhoto, makeThumbnail, PHOTO_EXTENSIONS } from './photo-image';

/** What the upload interceptor hands over; only the bytes are used. */
export interface UploadedPhoto {
  buffer: Buffer;
}

export type PhotoVariant = 'original' | 'thumbnail';

export interface PhotoFile {
  body: Buffer;
  contentType: string;
}

/** Where a photo's files live: names made from server ids only, so no upload name ever reaches the disk. */
export function photoPaths(root: string, shearId: string, photoId: string, contentType: ShearPhoto['contentType']) {
  const folder = join(root, shearId);
  return {
    folder,
    original: join(folder, `${photoId}.${PHOTO_EXTENSIONS[contentType]}`),
    thumbnail: join(folder, `${photoId}.thumb.webp`),
  };
}

@Injectable()
export class ShearPhotosService {
  private readonly root: string;

  constructor(
    @InjectRepository(ShearPhoto) private readonly photos: Repository<ShearPhoto>,
    private readonly access: RegistryAccess,
    config: ConfigService<AppConfig, true>,
  ) {
    this.root = resolve(config.get('DATA_DIR', { infer: true }), 'photos');
  }

  async add(actor: Actor, shearId: string, upload: UploadedPhoto | undefined): Promise<ShearPhotoDto> {
    const shear = await this.access.requireShear(actor, shearId, 'add-photo');
    if (!upload?.buffer?.length) {
      const message = 'Attach a photo (JPEG, PNG or WebP) in the field "photo".';
      throw new DomainError('invalid_input', message, { photo: [message] });
    }
    const image = await inspectPhoto(upload.buffer);
    const original = await cleanOriginal(upload.buffer, image.contentType);
    const thumbnail = await makeThumbnail(original);
    const id = randomUUID();
    const paths = photoPaths(this.root, shear.id, id, image.contentType);
    await mkdir(paths.folder, { recursive: true });
    try {
      await writeFile(paths.original, original, { flag: 'wx' });
      await writeFile(paths.thumbnail, thumbnail, { flag: 'wx' });
      const photo = await this.photos.save(
        this.photos.create({
          id,
          shearId: shear.id,
          contentType: image.contentType,
          byteSize: original.length,
          width: image.width,
          height: image.height,
          uploadedBy: actor.id,
        }),
      );
      return toShearPhoto(photo);
    } catch (error) {
      await removeFiles(paths);
      throw error;
    }
  }

  async open(actor: Actor, shearId: string, photoId: string, variant: PhotoVariant): Promise<PhotoFile> {
    const photo = await this.find(actor, shearId, photoId, 'read');
    const paths = photoPaths(this.root, photo.shearId, photo.id, photo.contentType);
    try {
      return variant === 'original'
        ? { body: await readFile(paths.original), contentType: photo.contentType }
        : { body: await readFile(paths.thumbnail), contentType: 'image/webp' };
    } catch {
      throw notFound("The photo's file");
    }
  }

  async remove(actor: Actor, shearId: string, photoId: string): Promise<void> {
    const photo = await this.find(actor, shearId, photoId, 'edit');
    await this.photos.delete({ id: photo.id });
    await removeFiles(photoPaths(this.root, photo.shearId, photo.id, photo.contentType));
  }

  private async find(actor: Actor, shearId: string, photoId: string, action: 'read' | 'edit'): Promise<ShearPhoto> {
    const shear = await this.access.requireShear(actor, shearId, action);
    const photo = await this.photos.findOneBy({ id: photoId, shearId: shear.id });
    if (!photo) throw notFound('The photo');
    return photo;
  }
}

async function removeFiles(paths: { original: string; thumbnail: string }): Promise<void> {
  await Promise.all([rm(paths.original, { force: true }), rm(paths.thumbnail, { force: true })]);
}
