import { Module } from '@nestjs/common';
import { InvoiceDocumentsModule } from '../documents/invoice-documents.module';
import { StatementsController } from './statements.controller';
import { StatementsService } from './statements.service';

/** Statements of account (PDF) per customer or per stop: invoices, payments, credits, opening and closing balance. */
@Module({
  imports: [InvoiceDocumentsModule],
  controllers: [StatementsController],
  providers: [StatementsService],
})
export class StatementsModule {}
