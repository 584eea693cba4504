import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { priceTicket, rateCardProblems, validateRateCard, type RateCard, type TicketPrice } from '@keenroute/shared';
import { Repository } from 'typeorm';
import type { Actor } from '../auth/actor';
import { DomainError } from '../common/errors/domain-error';
import type { QuoteDto } from './dto/quote.dto';
import { RateCardVersion } from './entities/rate-card-version.entity';

@Injectable()
export class RatesService {
  constructor(@InjectRepository(RateCardVersion) private readonly versions: Repository<RateCardVersion>) {}

  /** The card in force: the newest saved version. */
  current(): Promise<RateCardVersion | null> {
    return this.versions.findOne({ where: {}, order: { version: 'DESC' } });
  }

  history(limit = 50): Promise<RateCardVersion[]> {
    return this.versions.find({ order: { version: 'DESC' }, take: limit });
  }

  /** Saves a new version; every problem the shared rules find comes back at once, per field. */
  async save(actor: Actor, input: unknown): Promise<RateCardVersion> {
    const problems = rateCardProblems(input);
    if (problems.length > 0) {
      const fields: Record<string, string[]> = {};
      for (const problem of problems) (fields[`card.${problem.field}`] ??= []).push(problem.message);
      throw new DomainError('invalid_input', 'The rate card has problems to fix.', fields);
    }
    const card: RateCard = validateRateCard(input);
    return this.versions.save(this.versions.create({ card, createdBy: actor.id }));
  }

  async quote(dto: QuoteDto): Promise<{ version: number; price: TicketPrice }> {
    const current = await this.current();
    if (!current) throw new DomainError('conflict', 'No rate card is saved yet. The owner sets one on the Rates page.');
    const lines = dto.lines.map((line) => ({ shear: { ...line.shear }, addOns: line.addOns ?? [] }));
    const price = priceTicket(lines, current.card, { taxRateBp: dto.taxRateBp, chargeTrip: dto.chargeTrip ?? false });
    return { version: current.version, price };
  }
}
