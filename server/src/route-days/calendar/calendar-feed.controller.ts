import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../../auth/actor';
import { CurrentUser } from '../../auth/decorators/current-user.decorator';
import { Roles } from '../../auth/decorators/roles.decorator';
import { CalendarFeedService } from './calendar-feed.service';
import { CalendarFeedDto } from './dto/calendar-feed-response.dto';

/** Literal paths under route-days/: this controller is registered before the route-days one and its :id. */
@ApiTags('route-days')
@ApiBearerAuth()
@Roles('sharpener', 'owner')
@Controller('route-days/calendar-feed')
export class CalendarFeedController {
  constructor(private readonly feeds: CalendarFeedService) {}

  @Get()
  async get(@CurrentUser() actor: Actor): Promise<CalendarFeedDto> {
    return { url: await this.feeds.feedUrl(actor) };
  }

  @Post('renew')
  @HttpCode(200)
  async renew(@CurrentUser() actor: Actor): Promise<CalendarFeedDto> {
    return { url: await this.feeds.renew(actor) };
  }
}
