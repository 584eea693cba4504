import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { DomainError } from '../common/errors/domain-error';
import type { PlanningSettingsDto } from './dto/planning-settings.dto';
import { PlanningSettings } from './entities/planning-settings.entity';

const NEEDS_ATTENTION = 'Some fields need attention.';

/** The business's one row of planning settings. */
@Injectable()
export class PlanningSettingsService {
  constructor(@InjectRepository(PlanningSettings) private readonly settings: Repository<PlanningSettings>) {}

  async get(): Promise<PlanningSettingsDto> {
    return toDto(await this.require());
  }

  /** The settings, or a clear refusal when the base has never been set (planning needs a place to start from). */
  async require(): Promise<PlanningSettings> {
    const row = await this.settings.findOneBy({ id: 1 });
    if (!row) {
      throw new DomainError('conflict', 'Set the base in the planning settings first: route days start and end there.');
    }
    return row;
  }

  async put(dto: PlanningSettingsDto): Promise<PlanningSettingsDto> {
    const fields: Record<string, string[]> = {};
    if (dto.shiftStart >= dto.latestFinish) fields.latestFinish = ['The latest finish comes after the start.'];
    if (dto.lunchEarliest > dto.lunchLatest) fields.lunchLatest = ['The break window closes after it opens.'];
    if (Object.keys(fields).length > 0) throw new DomainError('invalid_input', NEEDS_ATTENTION, fields);
    await this.settings.save(this.settings.create({ id: 1, ...dto, workWeekdays: [...new Set(dto.workWeekdays)] }));
    return this.get();
  }
}

export function toDto(row: PlanningSettings): PlanningSettingsDto {
  return {
    baseLabel: row.baseLabel,
    baseLatitude: row.baseLatitude,
    baseLongitude: row.baseLongitude,
    workWeekdays: row.workWeekdays,
    shiftStart: row.shiftStart,
    latestFinish: row.latestFinish,
    lunchEarliest: row.lunchEarliest,
    lunchLatest: row.lunchLatest,
    lunchMinutes: row.lunchMinutes,
    circuity: row.circuity,
    averageSpeedKmh: row.averageSpeedKmh,
    noticeDays: row.noticeDays,
    solveSeconds: row.solveSeconds,
    bookingCutoffDaysBefore: row.bookingCutoffDaysBefore,
    bookingCutoffHour: row.bookingCutoffHour,
  };
}
