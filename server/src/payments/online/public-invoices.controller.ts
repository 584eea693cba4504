import { Controller, Get, HttpCode, Param, Post, UseGuards } from '@nestjs/common';
import {
  ApiConflictResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiServiceUnavailableResponse,
  ApiTags,
  ApiTooManyRequestsResponse,
} from '@nestjs/swagger';
import { Throttle, ThrottlerGuard } from '@nestjs/throttler';
import { Public } from '../../auth/decorators/public.decorator';
import { PUBLIC_READS, PUBLIC_WRITES } from '../../bookings/public-rate-limits';
import { CheckoutStartedDto, PublicInvoiceDto, PublicInvoiceStatusDto } from './dto/public-invoice.dto';
import { InvoiceCheckouts } from './invoice-checkouts';
import { PublicInvoicesService } from './public-invoices.service';

/** The pay link's page: read the invoice, start an online checkout, poll for the payment. No sign-in; rate limited. */
@ApiTags('public invoices')
@ApiTooManyRequestsResponse({ description: 'Too many requests from this address' })
@ApiNotFoundResponse({ description: 'The link does not verify, or names a draft' })
@Public()
@UseGuards(ThrottlerGuard)
@Controller('public/invoices')
export class PublicInvoicesController {
  constructor(
    private readonly invoices: PublicInvoicesService,
    private readonly checkouts: InvoiceCheckouts,
  ) {}

  @Get(':token')
  @Throttle(PUBLIC_READS)
  @ApiOkResponse({ type: PublicInvoiceDto })
  read(@Param('token') token: string): Promise<PublicInvoiceDto> {
    return this.invoices.read(token);
  }

  @Get(':token/status')
  @Throttle(PUBLIC_READS)
  @ApiOkResponse({ type: PublicInvoiceStatusDto, description: 'Changes only when the webhook has recorded a payment' })
  status(@Param('token') token: string): Promise<PublicInvoiceStatusDto> {
    return this.invoices.status(token);
  }

  @Post(':token/checkout')
  @HttpCode(200)
  @Throttle(PUBLIC_WRITES)
  @ApiOkResponse({ type: CheckoutStartedDto, description: 'Send the browser to this URL' })
  @ApiConflictResponse({ description: 'Nothing is owed, or the invoice is void' })
  @ApiServiceUnavailableResponse({ description: 'The payment service did not answer' })
  checkout(@Param('token') token: string): Promise<CheckoutStartedDto> {
    return this.checkouts.start(token);
  }
}
