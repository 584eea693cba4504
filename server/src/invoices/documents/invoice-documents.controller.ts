import {
  Body,
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Param,
  ParseUUIDPipe,
  Post,
  StreamableFile,
} from '@nestjs/common';
import { ApiAcceptedResponse, ApiBearerAuth, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../../auth/actor';
import { CurrentUser } from '../../auth/decorators/current-user.decorator';
import { Roles } from '../../auth/decorators/roles.decorator';
import { InvoiceDto } from '../dto/invoice-response.dto';
import { InvoiceMailDto, SendInvoiceDto } from './dto/invoice-documents.dto';
import { InvoiceDocumentsService, type InvoicePdfFile } from './invoice-documents.service';

export function pdfResponse(file: InvoicePdfFile, disposition: 'inline' | 'attachment'): StreamableFile {
  return new StreamableFile(file.pdf, {
    type: 'application/pdf',
    disposition: `${disposition}; filename="${file.fileName}"`,
    length: file.pdf.length,
  });
}

@ApiTags('invoices')
@ApiBearerAuth()
@Controller('invoices/:id')
export class InvoiceDocumentsController {
  constructor(private readonly documents: InvoiceDocumentsService) {}

  @Roles('owner', 'office', 'sharpener', 'client')
  @Get('pdf')
  @ApiProduces('application/pdf')
  async pdf(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<StreamableFile> {
    return pdfResponse(await this.documents.pdf(actor, id), 'attachment');
  }

  /** Issues a draft first; the same route again is a resend. 202: the e-mail is queued, the send log tells how it went. */
  @Roles('owner', 'office')
  @Post('send')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({ type: InvoiceDto, description: "Issued, and the e-mail queued ('queued' in the send log)" })
  send(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: SendInvoiceDto,
  ): Promise<InvoiceDto> {
    return this.documents.send(actor, id, dto);
  }

  @Roles('owner', 'office')
  @Get('mails')
  @ApiOkResponse({ type: [InvoiceMailDto], description: 'The send log, newest first: invoice, reminders, receipts' })
  mails(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<InvoiceMailDto[]> {
    return this.documents.mailLog(actor, id);
  }
}
