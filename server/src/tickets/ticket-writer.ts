import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { In, type EntityManager } from 'typeorm';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import type { AppConfig } from '../config/environment';
import { RateCardVersion } from '../rates/entities/rate-card-version.entity';
import { Shear } from '../shears/entities/shear.entity';
import { todayIn } from '../stops/business-today';
import { Stop } from '../stops/entities/stop.entity';
import { TicketLine } from './entities/ticket-line.entity';
import { Ticket, type ExpectedPairs, type TicketKind } from './entities/ticket.entity';
import { priceLines } from './ticket-pricing';

export interface OpenTicket {
  customerId: string;
  stopId: string | null;
  routeDayId: string | null;
  visitDay: string;
  kind: TicketKind;
  bookingId?: string | null;
  expected?: ExpectedPairs[];
  notes?: string;
  /** A mailed-in drop-off is not part of a stop visit, so it never carries the trip charge. */
  tripChargeable: boolean;
}

/** The writes every ticket route shares: opening a ticket, locking it, and pricing it again after a change. */
@Injectable()
export class TicketWriter {
  constructor(private readonly config: ConfigService<AppConfig, true>) {}

  today(): string {
    return todayIn(this.config.get('BUSINESS_TIME_ZONE', { infer: true }));
  }

  /**
   * Opens a ticket on the rate card in force now (the ticket keeps it) and the stop's tax rate. The first ticket of a
   * stop visit (one stop, one visit day) carries the trip charge; the advisory lock makes two tickets opened at once
   * agree on which is first, and a unique index backs it.
   */
  async open(manager: EntityManager, actor: Actor, input: OpenTicket): Promise<Ticket> {
    const card = await manager.getRepository(RateCardVersion).findOne({ where: {}, order: { version: 'DESC' } });
    if (!card) throw new DomainError('conflict', 'No rate card is saved yet. The owner sets one on the Rates page.');
    const stop = input.stopId ? await manager.getRepository(Stop).findOneBy({ id: input.stopId }) : null;
    if (input.stopId && !stop) throw notFound('The stop');
    let chargeTrip = false;
    if (stop && input.tripChargeable) {
      await manager.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`ticket-trip:${stop.id}:${input.visitDay}`]);
      const carried = await manager
        .getRepository(Ticket)
        .exists({ where: { stopId: stop.id, visitDay: input.visitDay, chargeTrip: true } });
      chargeTrip = !carried;
    }
    const repo = manager.getRepository(Ticket);
    const ticket = await repo.save(
      repo.create({
        customerId: input.customerId,
        stopId: stop?.id ?? null,
        routeDayId: input.routeDayId,
        bookingId: input.bookingId ?? null,
        kind: input.kind,
        visitDay: input.visitDay,
        notes: input.notes ?? '',
        expected: input.expected ?? [],
        chargeTrip,
        currency: card.card.currency,
        taxRateBp: stop?.taxRateBp ?? 0,
        servicesTaxable: card.card.servicesTaxable,
        rateCardVersion: card.version,
        openedBy: actor.id,
      }),
    );
    await this.reprice(manager, ticket);
    return ticket;
  }

  /** The ticket row, locked for the rest of the transaction so two phones never half-apply a change. */
  async lock(manager: EntityManager, id: string): Promise<Ticket> {
    const ticket = await manager.getRepository(Ticket).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
    if (!ticket) throw notFound('The ticket');
    return ticket;
  }

  async lines(manager: EntityManager, ticketId: string): Promise<TicketLine[]> {
    return manager.getRepository(TicketLine).find({ where: { ticketId }, order: { position: 'ASC' } });
  }

  /** Prices the lines with priceTicket over the ticket's own rate card and tax rate, and stores the result. */
  async reprice(manager: EntityManager, ticket: Ticket): Promise<void> {
    const lines = await this.lines(manager, ticket.id);
    const shears = await manager.getRepository(Shear).findBy({ id: In(lines.map((line) => line.shearId)) });
    const byId = new Map(shears.map((shear) => [shear.id, shear]));
    const version = ticket.rateCardVersion
      ? await manager.getRepository(RateCardVersion).findOneBy({ version: ticket.rateCardVersion })
      : null;
    if (!version) throw new DomainError('conflict', "This ticket's rate card is missing; ask the owner.");
    const totals = priceLines(
      lines.map((line) => ({ ...line, shear: byId.get(line.shearId)! })),
      version.card,
      { taxRateBp: ticket.taxRateBp, chargeTrip: ticket.chargeTrip },
    );
    const lineRepo = manager.getRepository(TicketLine);
    for (const [index, line] of lines.entries()) {
      const priced = totals.lines[index]!;
      if (line.priceCents !== priced.priceCents || line.explanation !== priced.explanation) {
        await lineRepo.update(line.id, { priceCents: priced.priceCents, explanation: priced.explanation });
      }
    }
    Object.assign(ticket, {
      rulesSubtotalCents: totals.rulesSubtotalCents,
      subtotalCents: totals.subtotalCents,
      taxCents: totals.taxCents,
      totalCents: totals.totalCents,
      shearCount: lines.length,
      priceSummary: totals.summary,
    });
    await manager.getRepository(Ticket).save(ticket);
  }
}
