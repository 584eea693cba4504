import { Body, Controller, Get, HttpCode, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../../auth/decorators/roles.decorator';
import { ListNoticesQueryDto } from './dto/list-notices-query.dto';
import { toVisitNotice, VisitNoticeListDto } from './dto/notice-response.dto';
import { NoticeRunDto, RunNoticesDto } from './dto/run-notices.dto';
import { VisitNoticesService } from './visit-notices.service';

/** Literal paths under route-days/: this controller is registered before the route-days one and its :id. */
@ApiTags('route-days')
@ApiBearerAuth()
@Controller('route-days/notices')
export class VisitNoticesController {
  constructor(private readonly notices: VisitNoticesService) {}

  @Roles('owner')
  @Post('run')
  @HttpCode(200)
  run(@Body() dto: RunNoticesDto): Promise<NoticeRunDto> {
    return this.notices.queueDue(dto.today ?? this.notices.today());
  }

  @Roles('owner', 'office')
  @Get()
  async list(@Query() query: ListNoticesQueryDto): Promise<VisitNoticeListDto> {
    return { items: (await this.notices.list(query.day)).map(toVisitNotice) };
  }
}
