import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { AccessNotesDto } from './dto/access-notes.dto';
import { ComingDueQueryDto } from './dto/coming-due-query.dto';
import { CreateStopDto } from './dto/create-stop.dto';
import { ListStopsQueryDto } from './dto/list-stops-query.dto';
import { RecordVisitDto } from './dto/record-visit.dto';
import {
  StopDetailDto,
  StopListDto,
  StopSavedDto,
  StopVisitDto,
  StopVisitListDto,
  toStopDetail,
  toStopSummary,
} from './dto/stop-response.dto';
import { UpdateStopDto } from './dto/update-stop.dto';
import { StopsService, type SavedStop } from './stops.service';

const toStopSaved = ({ row, geocoding }: SavedStop): StopSavedDto => ({ ...toStopDetail(row), geocoding });

@ApiTags('stops')
@ApiBearerAuth()
@Controller('stops')
export class StopsController {
  constructor(private readonly stops: StopsService) {}

  @Roles('owner', 'office', 'sharpener')
  @Get()
  async list(@CurrentUser() actor: Actor, @Query() query: ListStopsQueryDto): Promise<StopListDto> {
    const { items, total } = await this.stops.list(actor, query);
    return { items: items.map(toStopSummary), total };
  }

  // Declared before :id so "coming-due" is not read as an id.
  @Roles('owner', 'office', 'sharpener')
  @Get('coming-due')
  async comingDue(@CurrentUser() actor: Actor, @Query() query: ComingDueQueryDto): Promise<StopListDto> {
    const { items, total } = await this.stops.comingDue(actor, query);
    return { items: items.map(toStopSummary), total };
  }

  @Roles('owner', 'office', 'sharpener')
  @Get(':id')
  async get(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<StopDetailDto> {
    return toStopDetail(await this.stops.get(actor, id));
  }

  @Roles('owner', 'office')
  @Post()
  async create(@CurrentUser() actor: Actor, @Body() dto: CreateStopDto): Promise<StopSavedDto> {
    return toStopSaved(await this.stops.create(actor, dto));
  }

  @Roles('owner', 'office')
  @Patch(':id')
  async update(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: UpdateStopDto,
  ): Promise<StopSavedDto> {
    return toStopSaved(await this.stops.update(actor, id, dto));
  }

  @Roles('owner', 'office', 'sharpener')
  @Patch(':id/access-notes')
  async updateAccessNotes(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: AccessNotesDto,
  ): Promise<StopDetailDto> {
    return toStopDetail(await this.stops.updateAccessNotes(actor, id, dto));
  }

  @Roles('owner', 'office', 'sharpener')
  @Get(':id/visits')
  listVisits(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<StopVisitListDto> {
    return this.stops.listVisits(actor, id);
  }

  @Roles('owner', 'office')
  @Post(':id/visits')
  recordVisit(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: RecordVisitDto,
  ): Promise<StopVisitDto> {
    return this.stops.recordVisit(actor, id, dto);
  }
}
