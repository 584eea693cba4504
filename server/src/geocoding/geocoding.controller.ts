import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { Roles } from '../auth/decorators/roles.decorator';
import { GeocodeResultDto } from './dto/geocode-result.dto';
import { GeocodeSearchQueryDto } from './dto/geocode-search-query.dto';
import { GeocoderClient } from './geocoder-client';

@ApiTags('geocoding')
@ApiBearerAuth()
@Roles('owner', 'office')
@Controller('geocoding')
export class GeocodingController {
  constructor(private readonly geocoder: GeocoderClient) {}

  /** Looks an address up without saving anything: the stop form's "find on map". */
  @Get('search')
  search(@Query() query: GeocodeSearchQueryDto): Promise<GeocodeResultDto> {
    return this.geocoder.search(query.q);
  }
}
