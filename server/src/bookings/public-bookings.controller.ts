import { Body, Controller, Get, HttpCode, Param, Patch, Post, Req, Res, UseFilters, UseGuards } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiTags,
  ApiTooManyRequestsResponse,
} from '@nestjs/swagger';
import { Throttle, ThrottlerGuard } from '@nestjs/throttler';
import type { Request, Response } from 'express';
import type { Actor } from '../auth/actor';
import { Public } from '../auth/decorators/public.decorator';
import { DayFullFilter } from './day-full.error';
import { ChangeBookingDto, CreateBookingDto, QuoteBookingDto } from './dto/booking-input.dto';
import { BookingQuoteDto, CreatedBookingDto, PublicBookingDto } from './dto/booking-response.dto';
import { OptionalActorGuard } from './optional-actor.guard';
import { PublicBookingsService } from './public-bookings.service';
import { PUBLIC_READS, PUBLIC_WRITES } from './public-rate-limits';

/** Booking a drop-off, and the private link's read, change and cancel. No sign-in; rate limited per address. */
@ApiTags('public bookings')
@ApiTooManyRequestsResponse({ description: 'Too many requests from this address' })
@Public()
@UseGuards(ThrottlerGuard)
@UseFilters(DayFullFilter)
@Controller('public/bookings')
export class PublicBookingsController {
  constructor(private readonly bookings: PublicBookingsService) {}

  @Post('quote')
  @HttpCode(200)
  @Throttle(PUBLIC_READS)
  @ApiOkResponse({ type: BookingQuoteDto, description: 'An estimate from the rate card in force' })
  quote(@Body() dto: QuoteBookingDto): Promise<BookingQuoteDto> {
    return this.bookings.quote(dto);
  }

  @Post()
  @Throttle(PUBLIC_WRITES)
  @UseGuards(OptionalActorGuard)
  @ApiCreatedResponse({ type: CreatedBookingDto })
  @ApiOkResponse({ type: CreatedBookingDto, description: 'The same idempotencyKey again: the booking it made' })
  @ApiBadRequestResponse({ description: 'Fields to fix, in `fields`' })
  @ApiConflictResponse({ description: 'Day full (with `nextDay`: the next day that fits, or null) or past its cutoff' })
  async create(
    @Body() dto: CreateBookingDto,
    @Req() request: Request & { user?: Actor | null },
    @Res({ passthrough: true }) response: Response,
  ): Promise<CreatedBookingDto> {
    const { result, created } = await this.bookings.create(dto, request.user ?? null);
    response.status(created ? 201 : 200);
    return result;
  }

  @Get(':token')
  @Throttle(PUBLIC_READS)
  @ApiOkResponse({ type: PublicBookingDto })
  read(@Param('token') token: string): Promise<PublicBookingDto> {
    return this.bookings.read(token);
  }

  @Patch(':token')
  @Throttle(PUBLIC_WRITES)
  @ApiOkResponse({ type: PublicBookingDto })
  change(@Param('token') token: string, @Body() dto: ChangeBookingDto): Promise<PublicBookingDto> {
    return this.bookings.change(token, dto);
  }

  @Post(':token/cancel')
  @HttpCode(200)
  @Throttle(PUBLIC_WRITES)
  @ApiOkResponse({ type: PublicBookingDto })
  cancel(@Param('token') token: string): Promise<PublicBookingDto> {
    return this.bookings.cancel(token);
  }
}
