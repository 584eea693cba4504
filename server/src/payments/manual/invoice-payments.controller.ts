import { Body, Controller, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiTags,
} from '@nestjs/swagger';
import type { Actor } from '../../auth/actor';
import { CurrentUser } from '../../auth/decorators/current-user.decorator';
import { Roles } from '../../auth/decorators/roles.decorator';
import { InvoiceDto } from '../../invoices/dto/invoice-response.dto';
import { RecordInvoicePaymentDto } from './dto/record-invoice-payment.dto';
import { InvoicePaymentsService } from './invoice-payments.service';

@ApiTags('invoices')
@ApiBearerAuth()
@Controller('invoices')
export class InvoicePaymentsController {
  constructor(private readonly payments: InvoicePaymentsService) {}

  /** A sharpener records payments only on invoices that bill tickets from their own route days. */
  @Roles('owner', 'office', 'sharpener')
  @Post(':id/payments')
  @ApiCreatedResponse({ type: InvoiceDto, description: 'The invoice with the payment and its new status' })
  @ApiBadRequestResponse({ description: 'More than the balance, or a cheque / terminal payment without a reference' })
  @ApiConflictResponse({ description: 'A draft, a void invoice, or nothing owed' })
  record(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Body() dto: RecordInvoicePaymentDto,
  ): Promise<InvoiceDto> {
    return this.payments.record(actor, id, dto);
  }
}
