import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BusinessProfile } from '../entities/business-profile.entity';
import { InvoiceMail } from '../entities/invoice-mail.entity';
import { Invoice } from '../entities/invoice.entity';
import { InvoicesModule } from '../invoices.module';
import { BusinessProfileController } from './business-profile.controller';
import { BusinessProfileService } from './business-profile.service';
import { InvoiceDocumentLoader } from './invoice-document';
import { InvoiceDocumentsController } from './invoice-documents.controller';
import { InvoiceDocumentsService } from './invoice-documents.service';
import { InvoiceMailer } from './invoice-mailer';
import { InvoicePdfService } from './invoice-pdf.service';
import { PublicInvoicePdfController } from './public-invoice-pdf.controller';

/** Invoices as documents: the business profile and logo, the PDF, e-mailing it and the send log. */
@Module({
  imports: [TypeOrmModule.forFeature([Invoice, InvoiceMail, BusinessProfile]), InvoicesModule],
  controllers: [BusinessProfileController, InvoiceDocumentsController, PublicInvoicePdfController],
  providers: [BusinessProfileService, InvoiceDocumentLoader, InvoicePdfService, InvoiceMailer, InvoiceDocumentsService],
  exports: [InvoicePdfService, InvoiceMailer, BusinessProfileService],
})
export class InvoiceDocumentsModule {}
