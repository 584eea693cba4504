import { ApiProperty } from '@nestjs/swagger';
import { WEEKDAYS, type Weekday } from '@keenroute/shared';
import { RefDto } from '../../stops/dto/stop-response.dto';
import { SCHEDULE_PROBLEMS, type ScheduleProblem } from '../entities/route-day-stop.entity';

/** Times of day in these DTOs are whole minutes after midnight in the business's time zone. */
export class PlaceDto {
  @ApiProperty() label: string;
  @ApiProperty() latitude: number;
  @ApiProperty() longitude: number;
}

export class MinuteWindowDto {
  @ApiProperty({ description: 'Minutes after midnight' }) from: number;
  @ApiProperty({ description: 'Minutes after midnight' }) to: number;
}

export class LunchDto {
  @ApiProperty() start: number;
  @ApiProperty({ description: 'How many stops come before the break' }) afterStops: number;
  @ApiProperty() minutes: number;
}

export class RouteDayStopDto {
  @ApiProperty({ format: 'uuid' }) stopId: string;
  @ApiProperty({ description: '0-based order in the day' }) position: number;
  @ApiProperty() name: string;
  @ApiProperty() street: string;
  @ApiProperty() city: string;
  @ApiProperty() latitude: number;
  @ApiProperty() longitude: number;
  @ApiProperty() arrival: number;
  @ApiProperty({ description: 'Bench work starts: the arrival, or the opening when early' }) start: number;
  @ApiProperty() leave: number;
  @ApiProperty({ type: MinuteWindowDto, description: 'The window told to the stop' }) arrivalWindow: MinuteWindowDto;
  @ApiProperty() benchMinutes: number;
  @ApiProperty() driveMinutesBefore: number;
  @ApiProperty() kmBefore: number;
  @ApiProperty({ description: 'Kept on this day when the week is planned again' }) locked: boolean;
  @ApiProperty({ description: 'Kept at this position too' }) positionLocked: boolean;
  @ApiProperty({ enum: SCHEDULE_PROBLEMS, nullable: true, type: String }) problem: ScheduleProblem | null;
  @ApiProperty({ nullable: true, type: String }) nextDueOn: string | null;
  @ApiProperty() daysOverdue: number;
}

export class RouteDayDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty({ example: '2026-12-08' }) day: string;
  @ApiProperty({ enum: WEEKDAYS }) weekday: Weekday;
  @ApiProperty({ type: RefDto }) sharpener: RefDto;
  @ApiProperty({ type: PlaceDto, description: 'Where the day starts and ends' }) start: PlaceDto;
  @ApiProperty() shiftStart: number;
  @ApiProperty() latestFinish: number;
  @ApiProperty({ type: LunchDto, nullable: true }) lunch: LunchDto | null;
  @ApiProperty({ nullable: true, type: Number }) departure: number | null;
  @ApiProperty({ nullable: true, type: Number }) finish: number | null;
  @ApiProperty() distanceKm: number;
  @ApiProperty() driveMinutes: number;
  @ApiProperty() benchMinutes: number;
  @ApiProperty({ description: 'Send it back with a change to refuse it if the day changed meanwhile' })
  version: number;
  @ApiProperty({ type: [RouteDayStopDto] }) stops: RouteDayStopDto[];
}

export const UNPLANNED_STOP_REASONS = [
  'window-closed',
  'day-too-long',
  'capacity',
  'lock-impossible',
  'no-coordinates',
  'closed-all-week',
  'taken-off',
] as const;
export type UnplannedStopReason = (typeof UNPLANNED_STOP_REASONS)[number];

export class UnplannedDto {
  @ApiProperty({ format: 'uuid' }) stopId: string;
  @ApiProperty() name: string;
  @ApiProperty() city: string;
  @ApiProperty({ enum: UNPLANNED_STOP_REASONS }) reason: UnplannedStopReason;
  @ApiProperty() reasonText: string;
}

export class WeekDto {
  @ApiProperty({ example: '2026-12-07' }) weekStart: string;
  @ApiProperty({ example: '2026-12-13' }) weekEnd: string;
  @ApiProperty({ description: "Today in the business's time zone" }) today: string;
  @ApiProperty({ type: [RefDto] }) sharpeners: RefDto[];
  @ApiProperty({ type: [RouteDayDto] }) days: RouteDayDto[];
  @ApiProperty({ type: [UnplannedDto] }) unplanned: UnplannedDto[];
  @ApiProperty({ nullable: true, type: String }) plannedAt: string | null;
  @ApiProperty({ nullable: true, type: Number }) solveMs: number | null;
}

export class ChangedDaysDto {
  @ApiProperty({ type: [RouteDayDto], description: 'Every day the change touched, with new times' })
  days: RouteDayDto[];
}

export const REASON_TEXT: Readonly<Record<UnplannedStopReason, string>> = {
  'window-closed': 'Its opening hours leave no time for the bench work on any route day this week.',
  'day-too-long': 'No route day this week has room for it before the latest finish.',
  capacity: 'The route days this week are full.',
  'lock-impossible': 'It is locked to a day or position that no longer works.',
  'no-coordinates': 'It has no map position yet: place its pin on the stop page.',
  'closed-all-week': 'It is shut on every work day of this week.',
  'taken-off': 'Taken off its route day by hand.',
};
