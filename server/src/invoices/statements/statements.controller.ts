import { Controller, Get, Param, ParseUUIDPipe, Query, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../../auth/actor';
import { CurrentUser } from '../../auth/decorators/current-user.decorator';
import { Roles } from '../../auth/decorators/roles.decorator';
import { StatementQueryDto } from './dto/statement-query.dto';
import { StatementsService, type StatementFile } from './statements.service';

const pdf = (file: StatementFile) =>
  new StreamableFile(file.pdf, {
    type: 'application/pdf',
    disposition: `attachment; filename="${file.fileName}"`,
    length: file.pdf.length,
  });

@ApiTags('invoices')
@ApiBearerAuth()
@Roles('owner', 'office', 'client')
@Controller('statements')
export class StatementsController {
  constructor(private readonly statements: StatementsService) {}

  /** The invoices billed to one customer, with what was paid and credited, over a period. */
  @Get('customers/:id')
  @ApiProduces('application/pdf')
  async customer(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Query() query: StatementQueryDto,
  ): Promise<StreamableFile> {
    return pdf(await this.statements.forCustomer(actor, id, query));
  }

  /** The invoices billed to a stop that pays for its people. */
  @Get('stops/:id')
  @ApiProduces('application/pdf')
  async stop(
    @CurrentUser() actor: Actor,
    @Param('id', ParseUUIDPipe) id: string,
    @Query() query: StatementQueryDto,
  ): Promise<StreamableFile> {
    return pdf(await this.statements.forStop(actor, id, query));
  }
}
