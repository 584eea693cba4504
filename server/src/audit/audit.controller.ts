import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/decorators/roles.decorator';
import { AuditService } from './audit.service';
import { AuditListDto, toAuditEntryDto } from './dto/audit-entry-response.dto';
import { ListAuditQueryDto } from './dto/list-audit-query.dto';

/** The owner reads who signed in, changed roles and prices, voided, credited and took money. */
@ApiTags('audit')
@ApiBearerAuth()
@Roles('owner')
@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  async list(@Query() query: ListAuditQueryDto): Promise<AuditListDto> {
    const { items, total } = await this.audit.list(query);
    return { items: items.map(toAuditEntryDto), total, page: query.page, pageSize: query.pageSize };
  }
}
