import { Body, Controller, Get, HttpCode, HttpStatus, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { DEMO_RATE_CARD, type TicketPrice } from '@keenroute/shared';
import type { Actor } from '../auth/actor';
import { CurrentUser } from '../auth/decorators/current-user.decorator';
import { Roles } from '../auth/decorators/roles.decorator';
import { QuoteDto } from './dto/quote.dto';
import { RateCardResponseDto, toRateCardResponse, UpdateRateCardDto } from './dto/rate-card.dto';
import { RatesService } from './rates.service';

@ApiTags('rates')
@ApiBearerAuth()
@Controller('rates')
export class RatesController {
  constructor(private readonly rates: RatesService) {}

  /** The card in force; before any is saved, the invented demo card as a starting point, marked version null. */
  @Roles('owner', 'office', 'sharpener')
  @Get()
  async current(): Promise<RateCardResponseDto> {
    const current = await this.rates.current();
    return current ? toRateCardResponse(current) : { version: null, card: DEMO_RATE_CARD, savedAt: null };
  }

  @Roles('owner', 'office')
  @Get('history')
  async history(): Promise<{ items: RateCardResponseDto[]; total: number }> {
    const items = (await this.rates.history()).map(toRateCardResponse);
    return { items, total: items.length };
  }

  @Roles('owner')
  @Put()
  async save(@CurrentUser() actor: Actor, @Body() dto: UpdateRateCardDto): Promise<RateCardResponseDto> {
    return toRateCardResponse(await this.rates.save(actor, dto.card));
  }

  @Roles('owner', 'office', 'sharpener')
  @Post('quote')
  @HttpCode(HttpStatus.OK)
  quote(@Body() dto: QuoteDto): Promise<{ version: number; price: TicketPrice }> {
    return this.rates.quote(dto);
  }
}
