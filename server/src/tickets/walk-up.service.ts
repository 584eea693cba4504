import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import type { Actor } from '../auth/actor';
import { DomainError } from '../common/errors/domain-error';
import { CustomersService } from '../customers/customers.service';
import type { TicketDto } from './dto/ticket-response.dto';
import type { WalkUpDto } from './dto/walk-up.dto';
import { TicketsService } from './tickets.service';
import { TicketWriter } from './ticket-writer';

/**
 * A walk-up: registers the new customer at the stop and opens their ticket. A sharpener may do it only at a stop on
 * their own route day (the one given, or today's), checked before anything is written, so a refusal leaves no
 * customer behind.
 */
@Injectable()
export class WalkUpService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly customers: CustomersService,
    private readonly tickets: TicketsService,
    private readonly writer: TicketWriter,
  ) {}

  async open(actor: Actor, dto: WalkUpDto): Promise<TicketDto> {
    if (actor.role === 'sharpener') {
      const [day] = await this.dataSource.query<{ id: string }[]>(
        `SELECT rd.id FROM route_days rd JOIN route_day_stops rds ON rds.route_day_id = rd.id AND rds.stop_id = $1
          WHERE rd.sharpener_id = $2 AND (rd.id = $3 OR ($3::uuid IS NULL AND rd.day = $4::date))`,
        [dto.stopId, actor.id, dto.routeDayId ?? null, this.writer.today()],
      );
      if (!day) {
        throw new DomainError('forbidden', 'You can take walk-ups only at a stop on your own route day.');
      }
    }
    const customer = await this.customers.create(actor, { ...dto.customer, stopId: dto.stopId });
    return this.tickets.create(actor, {
      customerId: customer.id,
      stopId: dto.stopId,
      routeDayId: dto.routeDayId,
      kind: 'walk-up',
    });
  }
}
