import { Controller, Get, Param, ParseUUIDPipe, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { BookingsService } from './bookings.service';
import { BookingQueryDto } from './dto/booking-query.dto';
import { BookingDto, BookingListDto } from './dto/booking-response.dto';

/** Drop-offs per day and per stop, each caller seeing only the ones their role may. */
@ApiTags('bookings')
@ApiBearerAuth()
@Roles('owner', 'office', 'sharpener', 'client')
@Controller('bookings')
export class BookingsController {
  constructor(private readonly bookings: BookingsService) {}

  @Get()
  @ApiOkResponse({ type: BookingListDto })
  list(@CurrentUser() actor: Actor, @Query() query: BookingQueryDto): Promise<BookingListDto> {
    return this.bookings.list(actor, query);
  }

  @Get(':id')
  @ApiOkResponse({ type: BookingDto })
  get(@CurrentUser() actor: Actor, @Param('id', new ParseUUIDPipe()) id: string): Promise<BookingDto> {
    return this.bookings.get(actor, id);
  }
}
