import { Module } from '@nestjs/common';
import { GeocoderClient } from './geocoder-client';
import { GeocodingController } from './geocoding.controller';

@Module({
  controllers: [GeocodingController],
  providers: [GeocoderClient],
  exports: [GeocoderClient],
})
export class GeocodingModule {}
