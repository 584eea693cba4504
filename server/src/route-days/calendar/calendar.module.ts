import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { Stop } from '../../stops/entities/stop.entity';
import { User } from '../../users/entities/user.entity';
import { CalendarFeed } from '../entities/calendar-feed.entity';
import { RouteDayStop } from '../entities/route-day-stop.entity';
import { RouteDay } from '../entities/route-day.entity';
import { CalendarFeedController } from './calendar-feed.controller';
import { CalendarFeedService } from './calendar-feed.service';
import { CalendarController } from './calendar.controller';

@Module({
  imports: [TypeOrmModule.forFeature([CalendarFeed, User, RouteDay, RouteDayStop, Stop])],
  controllers: [CalendarFeedController, CalendarController],
  providers: [CalendarFeedService],
})
export class CalendarModule {}
