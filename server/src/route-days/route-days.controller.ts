import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Param,
  ParseUUIDPipe,
  Post,
  Put,
  Query,
  StreamableFile,
} from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiQuery, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { DaySheetService } from './day-sheet/day-sheet.service';
import type { DaySheetDto } from './day-sheet/day-sheet.dto';
import { LockStopDto, PlaceStopDto } from './dto/place-stop.dto';
import { PlanWeekDto } from './dto/plan-week.dto';
import { PlanningSettingsDto } from './dto/planning-settings.dto';
import { ChangedDaysDto, RouteDayDto, WeekDto } from './dto/route-day-response.dto';
import { WeekQueryDto } from './dto/week-query.dto';
import { PlanningSettingsService } from './planning-settings.service';
import { RouteDaysService } from './route-days.service';

@ApiTags('route-days')
@ApiBearerAuth()
@Controller('route-days')
export class RouteDaysController {
  constructor(
    private readonly routeDays: RouteDaysService,
    private readonly settings: PlanningSettingsService,
    private readonly sheets: DaySheetService,
  ) {}

  @Roles('owner', 'office', 'sharpener')
  @Get()
  week(@CurrentUser() actor: Actor, @Query() query: WeekQueryDto): Promise<WeekDto> {
    return this.routeDays.week(actor, query);
  }

  // Literal paths before :id, so "settings" and "plan" are never read as ids.
  @Roles('owner', 'office')
  @Get('settings')
  getSettings(): Promise<PlanningSettingsDto> {
    return this.settings.get();
  }

  @Roles('owner')
  @Put('settings')
  putSettings(@Body() dto: PlanningSettingsDto): Promise<PlanningSettingsDto> {
    return this.settings.put(dto);
  }

  @Roles('owner', 'office')
  @Post('plan')
  @HttpCode(200)
  plan(@CurrentUser() actor: Actor, @Body() dto: PlanWeekDto): Promise<WeekDto> {
    return this.routeDays.plan(actor, dto);
  }

  @Roles('owner', 'office', 'sharpener')
  @Get(':id')
  get(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<RouteDayDto> {
    return this.routeDays.get(actor, id);
  }

  @Roles('owner', 'office', 'sharpener')
  @Get(':id/sheet')
  @ApiQuery({ name: 'format', required: false, enum: ['json', 'pdf'] })
  @ApiProduces('application/json', 'application/pdf')
  async sheet(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Query('format') format: string | undefined,
  ): Promise<DaySheetDto | StreamableFile> {
    const sheet = await this.sheets.sheet(actor, id);
    if (format !== 'pdf') return sheet;
    const pdf = await this.sheets.pdf(sheet);
    return new StreamableFile(pdf, {
      type: 'application/pdf',
      disposition: `inline; filename="day-sheet-${sheet.routeDay.day}.pdf"`,
      length: pdf.length,
    });
  }

  @Roles('owner', 'office', 'sharpener')
  @Post(':id/stops')
  @HttpCode(200)
  place(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: PlaceStopDto,
  ): Promise<ChangedDaysDto> {
    return this.routeDays.place(actor, id, dto);
  }

  @Roles('owner', 'office')
  @Delete(':id/stops/:stopId')
  remove(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('stopId', ParseUUIDPipe) stopId: string,
  ): Promise<ChangedDaysDto> {
    return this.routeDays.remove(actor, id, stopId);
  }

  @Roles('owner', 'office', 'sharpener')
  @Post(':id/stops/:stopId/lock')
  @HttpCode(200)
  lock(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('stopId', ParseUUIDPipe) stopId: string,
    @Body() dto: LockStopDto,
  ): Promise<RouteDayDto> {
    return this.routeDays.lock(actor, id, stopId, dto);
  }

  @Roles('owner', 'office', 'sharpener')
  @Post(':id/stops/:stopId/unlock')
  @HttpCode(200)
  unlock(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('stopId', ParseUUIDPipe) stopId: string,
  ): Promise<RouteDayDto> {
    return this.routeDays.unlock(actor, id, stopId);
  }
}
