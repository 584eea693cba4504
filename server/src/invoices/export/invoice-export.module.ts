import { Module } from '@nestjs/common';
import { InvoiceExportController } from './invoice-export.controller';
import { InvoiceExportService } from './invoice-export.service';

/** CSV downloads of invoices and payments for the bookkeeper's spreadsheet. */
@Module({
  controllers: [InvoiceExportController],
  providers: [InvoiceExportService],
})
export class InvoiceExportModule {}
