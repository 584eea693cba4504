import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectRepository } from '@nestjs/typeorm';
import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { Repository } from 'typeorm';
import type { Actor } from '../../auth/actor';
import { DomainError, notFound } from '../../common/errors/domain-error';
import type { AppConfig } from '../../config/environment';
import { BusinessProfile } from '../entities/business-profile.entity';
import type { BusinessProfileDto, UpdateBusinessProfileDto } from './dto/business-profile.dto';
import { normaliseLogo } from './logo-image';

export const LOGO_PATH = '/api/business-profile/logo';
/** Logo files are named by the server only (random hex + .png), so no upload name ever reaches the disk. */
const LOGO_FILE = /^[0-9a-f]{32}\.png$/;

export interface UploadedLogo {
  buffer: Buffer;
}

export function toBusinessProfileDto(profile: BusinessProfile): BusinessProfileDto {
  return {
    name: profile.name,
    street: profile.street,
    city: profile.city,
    region: profile.region,
    postalCode: profile.postalCode,
    country: profile.country,
    phone: profile.phone,
    email: profile.email,
    website: profile.website,
    taxId: profile.taxId,
    invoiceFooter: profile.invoiceFooter,
    paymentTermsDays: profile.paymentTermsDays,
    reminderDays: profile.reminderDays,
    // The file name changes with each upload, so a cached old picture is never shown for a new one.
    logoUrl: profile.logoFile ? `${LOGO_PATH}?v=${profile.logoFile.slice(0, 12)}` : null,
  };
}

/** The one business profile (row id 1, written by the migration) and its logo under DATA_DIR/logos. */
@Injectable()
export class BusinessProfileService {
  private readonly logoDir: string;

  constructor(
    @InjectRepository(BusinessProfile) private readonly profiles: Repository<BusinessProfile>,
    config: ConfigService<AppConfig, true>,
  ) {
    this.logoDir = resolve(config.get('DATA_DIR', { infer: true }), 'logos');
  }

  async get(): Promise<BusinessProfileDto> {
    return toBusinessProfileDto(await this.profile());
  }

  async update(actor: Actor, dto: UpdateBusinessProfileDto): Promise<BusinessProfileDto> {
    const profile = await this.profile();
    const changes = Object.fromEntries(Object.entries(dto).filter(([, value]) => value !== undefined));
    await this.profiles.save(Object.assign(profile, changes, { updatedBy: actor.id }));
    return this.get();
  }

  async uploadLogo(actor: Actor, upload: UploadedLogo | undefined): Promise<BusinessProfileDto> {
    if (!upload?.buffer?.length) {
      const message = 'Attach the logo (PNG, JPEG or WebP, up to 2 MB) in the field "logo".';
      throw new DomainError('invalid_input', message, { logo: [message] });
    }
    const png = await normaliseLogo(upload.buffer);
    const file = `${randomBytes(16).toString('hex')}.png`;
    await mkdir(this.logoDir, { recursive: true });
    await writeFile(join(this.logoDir, file), png, { flag: 'wx' });
    const profile = await this.profile();
    const previous = profile.logoFile;
    try {
      await this.profiles.update({ id: 1 }, { logoFile: file, updatedBy: actor.id });
    } catch (error) {
      await this.removeFile(file);
      throw error;
    }
    await this.removeFile(previous);
    return this.get();
  }

  async removeLogo(actor: Actor): Promise<void> {
    const profile = await this.profile();
    if (!profile.logoFile) return;
    await this.profiles.update({ id: 1 }, { logoFile: null, updatedBy: actor.id });
    await this.removeFile(profile.logoFile);
  }

  /** The stored PNG, or null when there is none (or its file went missing: the invoice then prints without it). */
  async logo(profile?: BusinessProfile): Promise<Buffer | null> {
    const file = (profile ?? (await this.profile())).logoFile;
    if (!file || !LOGO_FILE.test(file)) return null;
    try {
      return await readFile(join(this.logoDir, file));
    } catch {
      return null;
    }
  }

  async requireLogo(): Promise<Buffer> {
    const logo = await this.logo();
    if (!logo) throw notFound('The business logo');
    return logo;
  }

  /** The row is written by the migration; should it ever be missing, it is made again with the column defaults. */
  async profile(): Promise<BusinessProfile> {
    const found = await this.profiles.findOneBy({ id: 1 });
    if (found) return found;
    await this.profiles.query('INSERT INTO business_profile (id) VALUES (1) ON CONFLICT DO NOTHING');
    return this.profiles.findOneByOrFail({ id: 1 });
  }

  private async removeFile(file: string | null): Promise<void> {
    if (file && LOGO_FILE.test(file)) await rm(join(this.logoDir, file), { force: true });
  }
}
