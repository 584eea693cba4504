import { Controller, Get, Header, Param } from '@nestjs/common';
import { ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import { Public } from '../../auth/decorators/public.decorator';
import { CalendarFeedService } from './calendar-feed.service';

/** The feed calendar apps poll: open, because they cannot sign in; the secret token in the address is the key. */
@ApiTags('route-days')
@Controller('calendar')
export class CalendarController {
  constructor(private readonly feeds: CalendarFeedService) {}

  @Public()
  @Get(':token.ics')
  @ApiProduces('text/calendar')
  @ApiOkResponse({ description: 'RFC 5545 iCalendar: an event per planned stop and one per route day' })
  @Header('Content-Type', 'text/calendar; charset=utf-8')
  // Calendar apps poll every few minutes to hours; five minutes of caching spares the database, and private keeps shared caches out.
  @Header('Cache-Control', 'private, max-age=300')
  feed(@Param('token') token: string): Promise<string> {
    return this.feeds.calendar(token);
  }
}
