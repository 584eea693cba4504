import {
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  ParseUUIDPipe,
  Patch,
  Post,
  Query,
} from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { CreateTicketDto } from './dto/create-ticket.dto';
import { AddLineDto, OverrideLineDto, UpdateLineDto } from './dto/line.dto';
import { ListTicketsQueryDto } from './dto/list-tickets-query.dto';
import { TicketDto, TicketListDto } from './dto/ticket-response.dto';
import { RecordPaymentDto, SettleDto } from './payments/dto/record-payment.dto';
import { TicketPaymentsService } from './payments/ticket-payments.service';
import { TicketClosing } from './ticket-closing';
import { TicketReader } from './ticket-reader';
import { TicketsService } from './tickets.service';
import { WalkUpService } from './walk-up.service';
import { WalkUpDto } from './dto/walk-up.dto';

@ApiTags('tickets')
@ApiBearerAuth()
@Controller('tickets')
export class TicketsController {
  constructor(
    private readonly tickets: TicketsService,
    private readonly reader: TicketReader,
    private readonly closing: TicketClosing,
    private readonly payments: TicketPaymentsService,
    private readonly walkUps: WalkUpService,
  ) {}

  /** Sharpeners see the tickets on their route days; clients their own. */
  @Roles('owner', 'office', 'sharpener', 'client')
  @Get()
  list(@CurrentUser() actor: Actor, @Query() query: ListTicketsQueryDto): Promise<TicketListDto> {
    return this.reader.list(actor, query);
  }

  @Roles('owner', 'office', 'sharpener')
  @Post('walk-up')
  walkUp(@CurrentUser() actor: Actor, @Body() dto: WalkUpDto): Promise<TicketDto> {
    return this.walkUps.open(actor, dto);
  }

  @Roles('owner', 'office', 'sharpener')
  @Post()
  create(@CurrentUser() actor: Actor, @Body() dto: CreateTicketDto): Promise<TicketDto> {
    return this.tickets.create(actor, dto);
  }

  @Roles('owner', 'office', 'sharpener', 'client')
  @Get(':id')
  get(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<TicketDto> {
    return this.reader.get(actor, id);
  }

  @Roles('owner', 'office', 'sharpener')
  @Post(':id/lines')
  addLine(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: AddLineDto,
  ): Promise<TicketDto> {
    return this.tickets.addLine(actor, id, dto);
  }

  @Roles('owner', 'office', 'sharpener')
  @Patch(':id/lines/:lineId')
  updateLine(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('lineId', ParseUUIDPipe) lineId: string,
    @Body() dto: UpdateLineDto,
  ): Promise<TicketDto> {
    return this.tickets.updateLine(actor, id, lineId, dto);
  }

  @Roles('owner', 'office', 'sharpener')
  @Delete(':id/lines/:lineId')
  removeLine(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('lineId', ParseUUIDPipe) lineId: string,
  ): Promise<TicketDto> {
    return this.tickets.removeLine(actor, id, lineId);
  }

  @Roles('owner', 'office')
  @Post(':id/lines/:lineId/override')
  @HttpCode(HttpStatus.OK)
  override(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Param('lineId', ParseUUIDPipe) lineId: string,
    @Body() dto: OverrideLineDto,
  ): Promise<TicketDto> {
    return this.tickets.override(actor, id, lineId, dto);
  }

  @Roles('owner', 'office', 'sharpener')
  @Post(':id/finish')
  @HttpCode(HttpStatus.OK)
  finish(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<TicketDto> {
    return this.closing.finish(actor, id);
  }

  @Roles('owner', 'office', 'sharpener')
  @Post(':id/hand-back')
  @HttpCode(HttpStatus.OK)
  handBack(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<TicketDto> {
    return this.closing.handBack(actor, id);
  }

  @Roles('owner', 'office', 'sharpener')
  @Post(':id/payments')
  recordPayment(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: RecordPaymentDto,
  ): Promise<TicketDto> {
    return this.payments.record(actor, id, dto);
  }

  @Roles('owner', 'office', 'sharpener')
  @Post(':id/settle')
  @HttpCode(HttpStatus.OK)
  // The DTO admits only "to-invoice"; validation is all it has to do here.
  settle(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() _dto: SettleDto,
  ): Promise<TicketDto> {
    return this.payments.leaveForInvoice(actor, id);
  }
}
