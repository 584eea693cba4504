import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { type EntityManager, QueryFailedError, Repository, type SelectQueryBuilder } from 'typeorm';
import { RegistryAccess } from '../access/registry-access';
import type { Actor } from '../auth/actor';
import { DomainError } from '../common/errors/domain-error';
import { likePattern } from '../common/pagination.dto';
import { Stop } from '../stops/entities/stop.entity';
import { User } from '../users/entities/user.entity';
import type { CreateCustomerDto } from './dto/create-customer.dto';
import {
  type CustomerDetailDto,
  type CustomerStopStretchDto,
  type CustomerSummaryDto,
  toCustomerDetail,
  toCustomerSummary,
} from './dto/customer-response.dto';
import type { ListCustomersQueryDto } from './dto/list-customers-query.dto';
import { refOrNull } from './dto/ref.dto';
import type { UpdateCustomerDto } from './dto/update-customer.dto';
import { CustomerStopHistory } from './entities/customer-stop-history.entity';
import { Customer } from './entities/customer.entity';

const SORT_COLUMNS = {
  name: 'customer.name',
  email: 'customer.email',
  stop: 'stop.name',
  createdAt: 'customer.createdAt',
};
const SHEAR_COUNT = '(SELECT COUNT(*)::int FROM shears counted WHERE counted.customer_id = customer.id)';
const EMAIL_TAKEN = 'Another customer already has that e-mail address.';
const ACCOUNT_TAKEN = 'That client account already belongs to another customer.';

interface SummaryRaw {
  customer_id: string;
  stop_id: string | null;
  stop_name: string | null;
  shear_count: number;
}

interface StretchRaw {
  stop_id: string;
  stop_name: string;
  started_at: Date;
  ended_at: Date | null;
}

@Injectable()
export class CustomersService {
  constructor(
    @InjectRepository(Customer) private readonly customers: Repository<Customer>,
    private readonly access: RegistryAccess,
  ) {}

  async list(actor: Actor, query: ListCustomersQueryDto): Promise<{ items: CustomerSummaryDto[]; total: number }> {
    const builder = this.access.scopeCustomers(this.summaryQuery(), actor, 'customer');
    const text = query.q?.trim();
    if (text) builder.andWhere('(customer.name ILIKE :q OR customer.email ILIKE :q)', { q: likePattern(text) });
    if (query.stopId) builder.andWhere('customer.stopId = :stopId', { stopId: query.stopId });
    if (query.active !== undefined) builder.andWhere('customer.active = :active', { active: query.active });
    const total = await builder.getCount();
    const { entities, raw } = await builder
      .orderBy(SORT_COLUMNS[query.sort], query.order === 'desc' ? 'DESC' : 'ASC', 'NULLS LAST')
      .addOrderBy('customer.id', 'ASC')
      .offset((query.page - 1) * query.pageSize)
      .limit(query.pageSize)
      .getRawAndEntities<SummaryRaw>();
    const extras = new Map(raw.map((row) => [row.customer_id, row]));
    const items = entities.map((customer) => {
      const row = extras.get(customer.id);
      return toCustomerSummary(
        customer,
        refOrNull(row?.stop_id ?? null, row?.stop_name ?? null),
        row?.shear_count ?? 0,
      );
    });
    return { items, total };
  }

  async get(actor: Actor, id: string): Promise<CustomerDetailDto> {
    return this.detail(await this.access.requireCustomer(actor, id, 'read'));
  }

  async create(_actor: Actor, dto: CreateCustomerDto): Promise<CustomerDetailDto> {
    const email = dto.email ?? null;
    const stopId = dto.stopId ?? null;
    const userId = dto.userId ?? null;
    await this.assertEmailFree(email);
    await this.assertStopExists(stopId);
    await this.assertAccountLinkable(userId);
    const created = await this.saving(() =>
      this.customers.manager.transaction(async (manager) => {
        const repo = manager.getRepository(Customer);
        const customer = await repo.save(
          repo.create({
            name: dto.name,
            email,
            phone: dto.phone ?? null,
            stopId,
            userId,
            notes: dto.notes ?? '',
            visitNoticeConsent: dto.visitNoticeConsent ?? false,
            active: dto.active ?? true,
          }),
        );
        if (stopId) await openStretch(manager, customer.id, stopId);
        return customer;
      }),
    );
    return this.detail(created);
  }

  async update(actor: Actor, id: string, dto: UpdateCustomerDto): Promise<CustomerDetailDto> {
    const customer = await this.access.requireCustomer(actor, id, 'edit');
    if (dto.email !== undefined && dto.email !== customer.email) await this.assertEmailFree(dto.email, customer.id);
    const moving = dto.stopId !== undefined && dto.stopId !== customer.stopId;
    if (moving) await this.assertStopExists(dto.stopId ?? null);
    if (dto.userId !== undefined && dto.userId !== customer.userId) {
      await this.assertAccountLinkable(dto.userId, customer.id);
    }
    Object.assign(customer, {
      name: dto.name ?? customer.name,
      email: dto.email === undefined ? customer.email : dto.email,
      phone: dto.phone === undefined ? customer.phone : dto.phone,
      stopId: dto.stopId === undefined ? customer.stopId : dto.stopId,
      userId: dto.userId === undefined ? customer.userId : dto.userId,
      notes: dto.notes === undefined ? customer.notes : (dto.notes ?? ''),
      visitNoticeConsent: dto.visitNoticeConsent ?? customer.visitNoticeConsent,
      active: dto.active ?? customer.active,
    });
    // The move and the record change land together or not at all, so the history never disagrees with stopId.
    const saved = await this.saving(() =>
      this.customers.manager.transaction(async (manager) => {
        const row = await manager.getRepository(Customer).save(customer);
        if (moving) {
          await manager
            .createQueryBuilder()
            .update(CustomerStopHistory)
            .set({ endedAt: () => 'now()' })
            .where('customer_id = :id AND ended_at IS NULL', { id: customer.id })
            .execute();
          if (row.stopId) await openStretch(manager, row.id, row.stopId);
        }
        return row;
      }),
    );
    return this.detail(saved);
  }

  private summaryQuery(): SelectQueryBuilder<Customer> {
    return this.customers
      .createQueryBuilder('customer')
      .leftJoin(Stop, 'stop', 'stop.id = customer.stopId')
      .addSelect('stop.id', 'stop_id')
      .addSelect('stop.name', 'stop_name')
      .addSelect(SHEAR_COUNT, 'shear_count');
  }

  private async detail(customer: Customer): Promise<CustomerDetailDto> {
    const manager = this.customers.manager;
    const [summary, user, stretches] = await Promise.all([
      this.summaryQuery().where('customer.id = :id', { id: customer.id }).getRawOne<SummaryRaw>(),
      customer.userId ? manager.getRepository(User).findOneBy({ id: customer.userId }) : Promise.resolve(null),
      manager
        .getRepository(CustomerStopHistory)
        .createQueryBuilder('history')
        .innerJoin(Stop, 'stop', 'stop.id = history.stopId')
        .select(['history.stopId AS stop_id', 'stop.name AS stop_name'])
        .addSelect(['history.startedAt AS started_at', 'history.endedAt AS ended_at'])
        .where('history.customerId = :id', { id: customer.id })
        .orderBy('history.startedAt', 'DESC')
        .addOrderBy('history.endedAt', 'DESC', 'NULLS FIRST')
        .getRawMany<StretchRaw>(),
    ]);
    return toCustomerDetail(customer, {
      stop: refOrNull(summary?.stop_id ?? null, summary?.stop_name ?? null),
      shearCount: summary?.shear_count ?? 0,
      user: user ? { id: user.id, email: user.email } : null,
      stopHistory: stretches.map(toStretch),
    });
  }

  private async assertEmailFree(email: string | null, exceptId?: string): Promise<void> {
    if (!email) return;
    const query = this.customers
      .createQueryBuilder('customer')
      .where('lower(customer.email) = lower(:email)', { email });
    if (exceptId) query.andWhere('customer.id <> :exceptId', { exceptId });
    if (await query.getExists()) throw new DomainError('conflict', EMAIL_TAKEN, { email: [EMAIL_TAKEN] });
  }

  private async assertStopExists(stopId: string | null): Promise<void> {
    if (!stopId) return;
    if (!(await this.customers.manager.getRepository(Stop).existsBy({ id: stopId }))) {
      const message = 'That stop does not exist. Choose a stop from the list.';
      throw new DomainError('invalid_input', message, { stopId: [message] });
    }
  }

  /** A customer's account must be a client's, and one account belongs to one customer. */
  private async assertAccountLinkable(userId: string | null, exceptCustomerId?: string): Promise<void> {
    if (!userId) return;
    const user = await this.customers.manager.getRepository(User).findOneBy({ id: userId });
    if (!user || user.role !== 'client') {
      const message = 'Link a client account: that user does not exist or is not a client.';
      throw new DomainError('invalid_input', message, { userId: [message] });
    }
    const holder = await this.customers.findOneBy({ userId });
    if (holder && holder.id !== exceptCustomerId) {
      throw new DomainError('conflict', ACCOUNT_TAKEN, { userId: [ACCOUNT_TAKEN] });
    }
  }

  /** Two saves racing past the checks meet the unique indexes; they answer as the checks would. */
  private async saving<T>(write: () => Promise<T>): Promise<T> {
    try {
      return await write();
    } catch (error) {
      const constraint = uniqueViolation(error);
      if (constraint === 'customers_email_key')
        throw new DomainError('conflict', EMAIL_TAKEN, { email: [EMAIL_TAKEN] });
      if (constraint?.startsWith('customers_user_id')) {
        throw new DomainError('conflict', ACCOUNT_TAKEN, { userId: [ACCOUNT_TAKEN] });
      }
      throw error;
    }
  }
}

function openStretch(manager: EntityManager, customerId: string, stopId: string) {
  return manager.getRepository(CustomerStopHistory).insert({ customerId, stopId, startedAt: () => 'now()' });
}

function uniqueViolation(error: unknown): string | undefined {
  if (!(error instanceof QueryFailedError)) return undefined;
  const driverError = error.driverError as { code?: string; constraint?: string };
  return driverError.code === '23505' ? driverError.constraint : undefined;
}

const toStretch = (row: StretchRaw): CustomerStopStretchDto => ({
  stop: { id: row.stop_id, name: row.stop_name },
  startedAt: row.started_at.toISOString(),
  endedAt: row.ended_at ? row.ended_at.toISOString() : null,
});
