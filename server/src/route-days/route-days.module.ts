import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { User } from '../users/entities/user.entity';
import { DaySheetService } from './day-sheet/day-sheet.service';
import { PlanningSettings } from './entities/planning-settings.entity';
import { RouteDayStop } from './entities/route-day-stop.entity';
import { RouteDay } from './entities/route-day.entity';
import { RouteWeekPlan } from './entities/route-week-plan.entity';
import { PlanningSettingsService } from './planning-settings.service';
import { ExpectedBenchService } from './planning/expected-bench';
import { SolverRunner } from './planning/solver-runner';
import { TravelMatrixService } from './planning/travel-matrix.service';
import { WeekPlanner } from './planning/week-planner';
import { RouteDayEditor } from './route-day-editor';
import { RouteDayReader } from './route-day-reader';
import { RouteDaysController } from './route-days.controller';
import { RouteDaysService } from './route-days.service';

@Module({
  imports: [TypeOrmModule.forFeature([PlanningSettings, RouteDay, RouteDayStop, RouteWeekPlan, User])],
  controllers: [RouteDaysController],
  providers: [
    RouteDaysService,
    RouteDayReader,
    RouteDayEditor,
    WeekPlanner,
    PlanningSettingsService,
    ExpectedBenchService,
    TravelMatrixService,
    SolverRunner,
    DaySheetService,
  ],
  exports: [RouteDaysService, PlanningSettingsService, RouteDayReader],
})
export class RouteDaysModule {}
