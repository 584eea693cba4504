import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { GeocodingModule } from '../geocoding/geocoding.module';
import { User } from '../users/entities/user.entity';
import { StopVisit } from './entities/stop-visit.entity';
import { Stop } from './entities/stop.entity';
import { StopListing } from './stop-listing';
import { StopsController } from './stops.controller';
import { StopsService } from './stops.service';

@Module({
  imports: [TypeOrmModule.forFeature([Stop, StopVisit, User]), GeocodingModule],
  controllers: [StopsController],
  providers: [StopsService, StopListing],
  exports: [StopsService, StopListing],
})
export class StopsModule {}
