import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { RatesModule } from '../rates/rates.module';
import { PlanningSettings } from '../route-days/entities/planning-settings.entity';
import { BookingClock } from './booking-clock';
import { BookingDays } from './booking-days';
import { BookingViews } from './booking-views';
import { BookingsController } from './bookings.controller';
import { BookingsService } from './bookings.service';
import { BookingItem } from './entities/booking-item.entity';
import { Booking } from './entities/booking.entity';
import { PublicBookingsController } from './public-bookings.controller';
import { PublicBookingsService } from './public-bookings.service';
import { PublicStopsController } from './public-stops.controller';
import { PublicStopsService } from './public-stops.service';

@Module({
  imports: [TypeOrmModule.forFeature([Booking, BookingItem, PlanningSettings]), RatesModule],
  controllers: [PublicStopsController, PublicBookingsController, BookingsController],
  providers: [BookingClock, BookingDays, BookingViews, PublicBookingsService, PublicStopsService, BookingsService],
  exports: [BookingViews, BookingClock],
})
export class BookingsModule {}
