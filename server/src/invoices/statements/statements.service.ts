import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { DEFAULT_CURRENCY } from '@keenroute/shared';
import type { DataSource } from 'typeorm';
import type { Actor } from '../../auth/actor';
import { DomainError, notFound } from '../../common/errors/domain-error';
import type { AppConfig } from '../../config/environment';
import { Customer } from '../../customers/entities/customer.entity';
import { todayIn } from '../../stops/business-today';
import { Stop } from '../../stops/entities/stop.entity';
import { BusinessProfileService } from '../documents/business-profile.service';
import { addressLines } from '../invoice-payer';
import type { StatementQueryDto } from './dto/statement-query.dto';
import { buildStatement } from './statement-ledger';
import { renderStatementPdf, type StatementDocument } from './statement-pdf';
import { accountCurrencies, loadStatementEntries, type StatementAccount } from './statement-source';

export interface StatementFile {
  pdf: Buffer;
  fileName: string;
}

const ADMIN = new Set(['owner', 'office']);

/**
 * Statements of account as PDF, per customer or per stop that pays. The office sees every account; a client sees
 * their own customer record and, as a shop manager, the shop's account and its people's (as InvoiceAccess reads
 * invoices). An account the caller may not see answers 404, as if it did not exist.
 */
@Injectable()
export class StatementsService {
  private readonly timeZone: string;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly profiles: BusinessProfileService,
    config: ConfigService<AppConfig, true>,
  ) {
    this.timeZone = config.get('BUSINESS_TIME_ZONE', { infer: true });
  }

  async forCustomer(actor: Actor, customerId: string, query: StatementQueryDto): Promise<StatementFile> {
    const customer = await this.dataSource.getRepository(Customer).findOneBy({ id: customerId });
    const stop = customer?.stopId ? await this.dataSource.getRepository(Stop).findOneBy({ id: customer.stopId }) : null;
    const mine = customer?.userId === actor.id || (stop !== null && stop.managerUserId === actor.id);
    if (!customer || !(ADMIN.has(actor.role) || mine)) throw notFound('The customer');
    const address = stop ? [`c/o ${stop.name}`, ...addressLines(stop)] : [];
    return this.statement({ kind: 'customer', id: customer.id }, customer, address, query);
  }

  async forStop(actor: Actor, stopId: string, query: StatementQueryDto): Promise<StatementFile> {
    const stop = await this.dataSource.getRepository(Stop).findOneBy({ id: stopId });
    if (!stop || !(ADMIN.has(actor.role) || stop.managerUserId === actor.id)) throw notFound('The stop');
    return this.statement({ kind: 'stop', id: stop.id }, stop, addressLines(stop), query);
  }

  private async statement(
    account: StatementAccount,
    holder: { name: string; email: string | null },
    address: string[],
    query: StatementQueryDto,
  ): Promise<StatementFile> {
    const today = todayIn(this.timeZone);
    const to = query.to ?? today;
    const from = query.from ?? `${to.slice(0, 8)}01`;
    if (from > to) {
      throw new DomainError('invalid_input', `The period starts (${from}) after it ends (${to}).`, {
        from: ['from must be on or before to.'],
      });
    }
    const currency = await this.currency(account, query.currency);
    const entries = await loadStatementEntries(this.dataSource.manager, account, currency, to, this.timeZone);
    const profile = await this.profiles.profile();
    const document: StatementDocument = {
      profile,
      logo: await this.profiles.logo(profile),
      account: { name: holder.name, email: holder.email, addressLines: address },
      currency,
      statementDate: today,
      ledger: buildStatement(entries, from, to),
    };
    return { pdf: await renderStatementPdf(document), fileName: `statement-${from}-to-${to}.pdf` };
  }

  /** One currency per statement: the account's own, or the one asked for when it has invoices in several. */
  private async currency(account: StatementAccount, asked: string | undefined): Promise<string> {
    const used = await accountCurrencies(this.dataSource.manager, account);
    if (asked) return asked;
    if (used.length > 1) {
      throw new DomainError(
        'invalid_input',
        `This account has invoices in ${used.join(', ')}; ask for one statement per currency.`,
        { currency: [`currency must be one of ${used.join(', ')}.`] },
      );
    }
    return used[0] ?? DEFAULT_CURRENCY;
  }
}
