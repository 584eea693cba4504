import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { Actor } from '../auth/actor';
import { DomainError, notFound } from '../common/errors/domain-error';
import { Invoice } from '../invoices/entities/invoice.entity';

/**
 * Who may do what with invoices: owner and office everything; a sharpener reads the invoices that bill a ticket on one
 * of their route days and records payments taken there; a client reads their own (a shop manager: the shop's). An
 * invoice the caller may not read answers 404, as if it did not exist. Drafts are the office's own work: only owner and
 * office see them.
 */
export type InvoiceAction = 'read' | 'take-payment' | 'manage';

const ADMIN = new Set(['owner', 'office']);
const ON_MY_ROUTE_DAYS = (alias: string) =>
  `EXISTS (SELECT 1 FROM tickets mine_t JOIN route_days mine_d ON mine_d.id = mine_t.route_day_id
     WHERE mine_t.invoice_id = ${alias}.id AND mine_d.sharpener_id = :scopeActor)`;
const MINE_AS_CLIENT = (alias: string) =>
  `(${alias}.customer_id IN (SELECT own.id FROM customers own WHERE own.user_id = :scopeActor)
    OR ${alias}.stop_id IN (SELECT shop.id FROM stops shop WHERE shop.manager_user_id = :scopeActor)
    OR ${alias}.customer_id IN (SELECT staff.id FROM customers staff JOIN stops shop ON shop.id = staff.stop_id
                                WHERE shop.manager_user_id = :scopeActor))`;

@Injectable()
export class InvoiceAccess {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  isAdmin(actor: Actor): boolean {
    return ADMIN.has(actor.role);
  }

  /** Narrows an invoices query (alias names the invoices table) to what the actor may read. */
  scopeInvoices<T extends ObjectLiteral>(query: SelectQueryBuilder<T>, actor: Actor, alias: string) {
    if (ADMIN.has(actor.role)) return query;
    const issued = `${alias}.status <> 'draft'`;
    if (actor.role === 'sharpener') {
      return query.andWhere(`${issued} AND ${ON_MY_ROUTE_DAYS(alias)}`, { scopeActor: actor.id });
    }
    if (actor.role === 'client') {
      return query.andWhere(`${issued} AND ${MINE_AS_CLIENT(alias)}`, { scopeActor: actor.id });
    }
    return query.andWhere('false');
  }

  async requireInvoice(actor: Actor, id: string, action: InvoiceAction): Promise<Invoice> {
    const invoice = await this.scopeInvoices(
      this.dataSource.getRepository(Invoice).createQueryBuilder('invoice').where('invoice.id = :id', { id }),
      actor,
      'invoice',
    ).getOne();
    if (!invoice) throw notFound('The invoice');
    if (ADMIN.has(actor.role) || action === 'read') return invoice;
    if (action === 'take-payment' && actor.role === 'sharpener') return invoice;
    throw new DomainError(
      'forbidden',
      action === 'take-payment'
        ? 'Payments on invoices are recorded by the office or the sharpener who took them.'
        : 'Only the owner or the office changes invoices.',
    );
  }
}
