import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { weekStart } from '@keenroute/shared';
import { RouteDayAccess } from '../access/route-day-access';
import type { Actor } from '../auth/actor';
import type { AppConfig } from '../config/environment';
import { todayIn } from '../stops/business-today';
import type { LockStopDto, PlaceStopDto } from './dto/place-stop.dto';
import type { PlanWeekDto } from './dto/plan-week.dto';
import type { ChangedDaysDto, RouteDayDto, WeekDto } from './dto/route-day-response.dto';
import type { WeekQueryDto } from './dto/week-query.dto';
import { WeekPlanner } from './planning/week-planner';
import { RouteDayEditor } from './route-day-editor';
import { RouteDayReader } from './route-day-reader';

/** Route days as the API offers them: read a week or a day, plan a week, and the hand changes. */
@Injectable()
export class RouteDaysService {
  constructor(
    private readonly access: RouteDayAccess,
    private readonly reader: RouteDayReader,
    private readonly planner: WeekPlanner,
    private readonly editor: RouteDayEditor,
    private readonly config: ConfigService<AppConfig, true>,
  ) {}

  today(): string {
    return todayIn(this.config.get('BUSINESS_TIME_ZONE', { infer: true }));
  }

  week(actor: Actor, query: WeekQueryDto): Promise<WeekDto> {
    const today = this.today();
    const sharpenerId = this.access.isPlanner(actor) ? query.sharpenerId : actor.id;
    return this.reader.week(actor, weekStart(query.week ?? today), today, sharpenerId);
  }

  async get(actor: Actor, id: string): Promise<RouteDayDto> {
    await this.access.requireRouteDay(actor, id, 'read');
    return this.one(id);
  }

  async plan(actor: Actor, dto: PlanWeekDto): Promise<WeekDto> {
    const today = this.today();
    const monday = weekStart(dto.week);
    await this.planner.plan(actor, monday, today, dto.sharpenerIds);
    return this.reader.week(actor, monday, today);
  }

  async place(actor: Actor, id: string, dto: PlaceStopDto): Promise<ChangedDaysDto> {
    return { days: await this.reader.days(await this.editor.place(actor, id, dto), this.today()) };
  }

  async remove(actor: Actor, id: string, stopId: string): Promise<ChangedDaysDto> {
    return { days: await this.reader.days(await this.editor.remove(actor, id, stopId), this.today()) };
  }

  async lock(actor: Actor, id: string, stopId: string, dto: LockStopDto): Promise<RouteDayDto> {
    await this.editor.setLock(actor, id, stopId, dto);
    return this.one(id);
  }

  async unlock(actor: Actor, id: string, stopId: string): Promise<RouteDayDto> {
    await this.editor.setLock(actor, id, stopId, null);
    return this.one(id);
  }

  private async one(id: string): Promise<RouteDayDto> {
    const [day] = await this.reader.days([id], this.today());
    return day!;
  }
}
