import type { EntityManager } from 'typeorm';
import { PlanningSettings } from '../../route-days/entities/planning-settings.entity';
import { DEMO_CENTRE } from './demo-city';

/**
 * The demo business's planning settings (invented): a workshop just south-west of Larkhaven's centre, Monday to
 * Friday 08:00-18:00 with a half-hour break between 11:30 and 13:30, the usual circuity and a town driving speed.
 */
export async function seedDemoPlanning(manager: EntityManager): Promise<boolean> {
  const repo = manager.getRepository(PlanningSettings);
  if (await repo.exists()) return false;
  await repo.insert({
    id: 1,
    baseLabel: 'Larkhaven workshop, 12 Foundry Lane (demo)',
    baseLatitude: Math.round((DEMO_CENTRE.latitude - 0.012) * 1e6) / 1e6,
    baseLongitude: Math.round((DEMO_CENTRE.longitude - 0.018) * 1e6) / 1e6,
    workWeekdays: ['mon', 'tue', 'wed', 'thu', 'fri'],
    shiftStart: 8 * 60,
    latestFinish: 18 * 60,
    lunchEarliest: 11 * 60 + 30,
    lunchLatest: 13 * 60 + 30,
    lunchMinutes: 30,
    circuity: 1.3,
    averageSpeedKmh: 35,
    noticeDays: 3,
    solveSeconds: 3,
  });
  return true;
}
