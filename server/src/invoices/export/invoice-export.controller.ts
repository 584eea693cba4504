import { Controller, Get, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Roles } from '../../auth/decorators/roles.decorator';
import { ExportQueryDto } from './dto/export-query.dto';
import { InvoiceExportService, type CsvFile } from './invoice-export.service';

/** Set only once the file is made: a refused range must still answer as JSON, not as a CSV. */
function download(response: Response, file: CsvFile): string {
  response.setHeader('Content-Type', 'text/csv; charset=utf-8');
  response.setHeader('Content-Disposition', `attachment; filename="${file.fileName}"`);
  return file.csv;
}

/** Literal paths beside invoices/:id: this module is registered before InvoicesModule so they match first. */
@ApiTags('invoices')
@ApiBearerAuth()
@Roles('owner', 'office')
@Controller()
export class InvoiceExportController {
  constructor(private readonly exports: InvoiceExportService) {}

  @Get('invoices/export.csv')
  @ApiProduces('text/csv')
  async invoices(@Query() query: ExportQueryDto, @Res({ passthrough: true }) response: Response): Promise<string> {
    return download(response, await this.exports.invoices(query));
  }

  @Get('payments/export.csv')
  @ApiProduces('text/csv')
  async payments(@Query() query: ExportQueryDto, @Res({ passthrough: true }) response: Response): Promise<string> {
    return download(response, await this.exports.payments(query));
  }
}
