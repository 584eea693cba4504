import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import { withoutStaffNotes } from '../access/staff-notes';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { CreateShearDto } from './dto/create-shear.dto';
import { LabelsQueryDto } from './dto/labels-query.dto';
import { ListShearsQueryDto } from './dto/list-shears-query.dto';
import { ShearDetailDto, ShearListDto } from './dto/shear-response.dto';
import { UpdateShearDto } from './dto/update-shear.dto';
import { ShearLabelsService } from './shear-labels.service';
import { ShearsService } from './shears.service';

@ApiTags('shears')
@ApiBearerAuth()
@Controller('shears')
export class ShearsController {
  constructor(
    private readonly shears: ShearsService,
    private readonly labels: ShearLabelsService,
  ) {}

  /** Reads follow the owning customer: sharpeners at their stops, clients their own (a shop manager: the shop's). */
  @Roles('owner', 'office', 'sharpener', 'client')
  @Get()
  list(@CurrentUser() actor: Actor, @Query() query: ListShearsQueryDto): Promise<ShearListDto> {
    return this.shears.list(actor, query);
  }

  // Declared before ':id' so "labels.pdf" and "by-tag" are never read as an id.
  @Roles('owner', 'office')
  @Get('labels.pdf')
  @ApiProduces('application/pdf')
  async labelSheet(@CurrentUser() actor: Actor, @Query() query: LabelsQueryDto): Promise<StreamableFile> {
    const { pdf, fileName } = await this.labels.sheet(actor, query);
    return new StreamableFile(pdf, {
      type: 'application/pdf',
      disposition: `attachment; filename="${fileName}"`,
      length: pdf.length,
    });
  }

  @Roles('owner', 'office', 'sharpener', 'client')
  @Get('by-tag/:tagCode')
  async byTag(@CurrentUser() actor: Actor, @Param('tagCode') tagCode: string): Promise<ShearDetailDto> {
    return withoutStaffNotes(actor, await this.shears.byTag(actor, tagCode));
  }

  @Roles('owner', 'office', 'sharpener', 'client')
  @Get(':id')
  async get(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<ShearDetailDto> {
    return withoutStaffNotes(actor, await this.shears.get(actor, id));
  }

  @Roles('owner', 'office')
  @Post()
  create(@CurrentUser() actor: Actor, @Body() dto: CreateShearDto): Promise<ShearDetailDto> {
    return this.shears.create(actor, dto);
  }

  @Roles('owner', 'office')
  @Patch(':id')
  update(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: UpdateShearDto,
  ): Promise<ShearDetailDto> {
    return this.shears.update(actor, id, dto);
  }
}
