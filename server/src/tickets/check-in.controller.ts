import { Controller, HttpCode, HttpStatus, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { CheckInService } from './check-in.service';
import { TicketDto } from './dto/ticket-response.dto';

/** Lives with tickets: checking in a booking makes its ticket. */
@ApiTags('tickets')
@ApiBearerAuth()
@Controller('bookings')
export class CheckInController {
  constructor(private readonly checkIn: CheckInService) {}

  @Roles('owner', 'office', 'sharpener')
  @Post(':id/check-in')
  @HttpCode(HttpStatus.OK)
  checkInBooking(@CurrentUser() actor: Actor, @Param('id', ParseUUIDPipe) id: string): Promise<TicketDto> {
    return this.checkIn.checkIn(actor, id);
  }
}
