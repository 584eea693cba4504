import { Controller, Get, Param, ParseUUIDPipe, Query, UseGuards } from '@nestjs/common';
import { ApiOkResponse, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { Throttle, ThrottlerGuard } from '@nestjs/throttler';
import { Public } from '../auth/decorators/public.decorator';
import { PublicStopQueryDto } from './dto/booking-input.dto';
import { PublicStopDto, PublicStopListDto } from './dto/booking-response.dto';
import { PUBLIC_READS } from './public-rate-limits';
import { PublicStopsService } from './public-stops.service';

/** The stops a groomer can book a drop-off at, without signing in. */
@ApiTags('public bookings')
@ApiTooManyRequestsResponse({ description: 'Too many requests from this address' })
@Public()
@UseGuards(ThrottlerGuard)
@Throttle(PUBLIC_READS)
@Controller('public/stops')
export class PublicStopsController {
  constructor(private readonly stops: PublicStopsService) {}

  @Get()
  @ApiOkResponse({ type: PublicStopListDto })
  search(@Query() query: PublicStopQueryDto): Promise<PublicStopListDto> {
    return this.stops.search(query.q);
  }

  @Get(':id')
  @ApiOkResponse({ type: PublicStopDto })
  get(@Param('id', new ParseUUIDPipe()) id: string): Promise<PublicStopDto> {
    return this.stops.get(id);
  }
}
