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
import { ApiBearerAuth, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { CreateCreditNoteDto } from './dto/create-credit-note.dto';
import { CreateInvoiceDto } from './dto/create-invoice.dto';
import { InvoiceDto, InvoiceListDto, ReadyGroupDto } from './dto/invoice-response.dto';
import { ListInvoicesQueryDto } from './dto/list-invoices-query.dto';
import { UpdateInvoiceDto } from './dto/update-invoice.dto';
import { VoidInvoiceDto } from './dto/void-invoice.dto';
import { InvoiceLists } from './invoice-lists';
import { InvoiceReader } from './invoice-reader';
import { InvoicesService } from './invoices.service';

@ApiTags('invoices')
@ApiBearerAuth()
@Controller('invoices')
export class InvoicesController {
  constructor(
    private readonly invoices: InvoicesService,
    private readonly reader: InvoiceReader,
    private readonly lists: InvoiceLists,
  ) {}

  /** Sharpeners see the invoices billing tickets on their route days; clients their own; drafts only the office. */
  @Roles('owner', 'office', 'sharpener', 'client')
  @Get()
  @ApiOkResponse({ type: InvoiceListDto })
  list(@CurrentUser() actor: Actor, @Query() query: ListInvoicesQueryDto): Promise<InvoiceListDto> {
    return this.lists.list(actor, query);
  }

  @Roles('owner', 'office')
  @Get('ready')
  @ApiOkResponse({ type: [ReadyGroupDto], description: 'Finished tickets left for an invoice, by who pays' })
  ready(): Promise<ReadyGroupDto[]> {
    return this.lists.ready();
  }

  @Roles('owner', 'office')
  @Post()
  @ApiCreatedResponse({ type: InvoiceDto, description: 'A draft' })
  create(@CurrentUser() actor: Actor, @Body() dto: CreateInvoiceDto): Promise<InvoiceDto> {
    return this.invoices.create(actor, dto);
  }

  @Roles('owner', 'office', 'sharpener', 'client')
  @Get(':id')
  @ApiOkResponse({ type: InvoiceDto })
  get(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<InvoiceDto> {
    return this.reader.get(actor, id);
  }

  @Roles('owner', 'office')
  @Patch(':id')
  @ApiOkResponse({ type: InvoiceDto, description: 'The draft, priced again' })
  update(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: UpdateInvoiceDto,
  ): Promise<InvoiceDto> {
    return this.invoices.update(actor, id, dto);
  }

  @Roles('owner', 'office')
  @Delete(':id')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'The draft is gone and its tickets are ready to invoice again' })
  remove(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<void> {
    return this.invoices.remove(actor, id);
  }

  @Roles('owner', 'office')
  @Post(':id/issue')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: InvoiceDto, description: 'Numbered and dated; an issued invoice comes back unchanged' })
  issue(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<InvoiceDto> {
    return this.invoices.issue(actor, id);
  }

  @Roles('owner', 'office')
  @Post(':id/void')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: InvoiceDto, description: 'Void with the reason; its tickets are ready to invoice again' })
  void(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: VoidInvoiceDto,
  ): Promise<InvoiceDto> {
    return this.invoices.void(actor, id, dto);
  }

  @Roles('owner', 'office')
  @Post(':id/credit-notes')
  @ApiCreatedResponse({ type: InvoiceDto, description: 'The invoice with the new credit note' })
  creditNote(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: CreateCreditNoteDto,
  ): Promise<InvoiceDto> {
    return this.invoices.creditNote(actor, id, dto);
  }
}
