import { Controller, Get, Param, StreamableFile, UseGuards } from '@nestjs/common';
import { ApiNotFoundResponse, ApiProduces, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { Throttle, ThrottlerGuard } from '@nestjs/throttler';
import { Public } from '../../auth/decorators/public.decorator';
import { PUBLIC_READS } from '../../bookings/public-rate-limits';
import { pdfResponse } from './invoice-documents.controller';
import { InvoiceDocumentsService } from './invoice-documents.service';

/** The invoice's PDF for whoever holds its pay link: the link's signature is the only key. */
@ApiTags('public invoices')
@ApiTooManyRequestsResponse({ description: 'Too many requests from this address' })
@Public()
@UseGuards(ThrottlerGuard)
@Throttle(PUBLIC_READS)
@Controller('public/invoices/:token/pdf')
export class PublicInvoicePdfController {
  constructor(private readonly documents: InvoiceDocumentsService) {}

  @Get()
  @ApiProduces('application/pdf')
  @ApiNotFoundResponse({ description: 'A link that is not valid, or an invoice not issued yet' })
  async pdf(@Param('token') token: string): Promise<StreamableFile> {
    return pdfResponse(await this.documents.publicPdf(token), 'inline');
  }
}
