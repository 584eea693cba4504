import type { DataSource } from 'typeorm';
import type { RegistryAccess } from '../access/registry-access';
import type { TicketAccess } from '../access/ticket-access';
import type { AuditRecord, AuditService } from '../audit/audit.service';
import type { Actor } from '../auth/actor';
import { DomainError } from '../common/errors/domain-error';
import { expectedPairs } from './check-in.service';
import { TicketLineOverride } from './entities/ticket-line-override.entity';
import { TicketLine } from './entities/ticket-line.entity';
import { Ticket } from './entities/ticket.entity';
import type { ShearsService } from '../shears/shears.service';
import type { TicketReader } from './ticket-reader';
import type { TicketWriter } from './ticket-writer';
import { takeExpected, TicketsService } from './tickets.service';

const office: Actor = { id: 'user-olive', email: 'o@x.test', name: 'Olive', role: 'office' };

function setUp(ticket: Partial<Ticket>, line: Partial<TicketLine>, paymentCount = 0) {
  const calls: string[] = [];
  const audit: Partial<TicketLineOverride>[] = [];
  const lineChanges: Partial<TicketLine>[] = [];
  const manager = {
    query: () => Promise.resolve([{ n: paymentCount }]),
    getRepository: (entity: unknown) => {
      if (entity === TicketLine) {
        return {
          findOneBy: () => Promise.resolve(line),
          update: (_id: string, change: Partial<TicketLine>) => {
            calls.push('update line');
            lineChanges.push(change);
            return Promise.resolve();
          },
          findBy: () => Promise.resolve([line]),
        };
      }
      if (entity === TicketLineOverride) {
        return {
          insert: (row: Partial<TicketLineOverride>) => {
            calls.push('audit');
            audit.push(row);
            return Promise.resolve();
          },
        };
      }
      if (entity === Ticket) return { save: (row: Ticket) => Promise.resolve(row) };
      throw new Error('unexpected repository');
    },
  };
  const dataSource = { transaction: (work: (m: typeof manager) => Promise<unknown>) => work(manager) };
  const access = { requireTicket: jest.fn(() => Promise.resolve(ticket)) } as unknown as TicketAccess;
  const writer = {
    lock: () => Promise.resolve(ticket),
    reprice: () => {
      calls.push('reprice');
      return Promise.resolve();
    },
  } as unknown as TicketWriter;
  const reader = { detail: (id: string) => Promise.resolve({ id }) } as unknown as TicketReader;
  const logged: { entry: AuditRecord; manager: unknown }[] = [];
  const auditLog = {
    record: (entry: AuditRecord, inTransaction: unknown) => {
      calls.push('audit log');
      logged.push({ entry, manager: inTransaction });
      return Promise.resolve();
    },
  } as unknown as AuditService;
  const sut = new TicketsService(
    dataSource as unknown as DataSource,
    access,
    {} as RegistryAccess,
    writer,
    reader,
    {} as ShearsService,
    auditLog,
  );
  return { sut, calls, audit, lineChanges, access, logged, manager };
}

const openTicket: Partial<Ticket> = { id: 'ticket-1', status: 'open', settlement: 'unpaid' };
const pricedLine: Partial<TicketLine> = {
  id: 'line-1',
  ticketId: 'ticket-1',
  shearId: 'shear-1',
  priceCents: 4200,
  overrideCents: null,
  benchStatus: 'waiting',
};

describe('TicketsService.override', () => {
  it('asks for the override right, keeps an audit row from the price in force, then prices again', async () => {
    const { sut, calls, audit, lineChanges, access, logged, manager } = setUp(openTicket, {
      ...pricedLine,
      overrideCents: 3500,
    });
    await sut.override(office, 'ticket-1', 'line-1', { cents: 3000, reason: 'Regular shop' });
    expect(access.requireTicket).toHaveBeenCalledWith(office, 'ticket-1', 'override');
    expect(calls).toEqual(['audit', 'audit log', 'update line', 'reprice']);
    // The owner's log entry is written with the transaction's manager, so it commits or rolls back with the price.
    expect(logged).toEqual([
      {
        entry: {
          action: 'price-override',
          actor: office,
          subject: { type: 'ticket', id: 'ticket-1' },
          detail: { lineId: 'line-1', shearId: 'shear-1', fromCents: 3500, toCents: 3000, reason: 'Regular shop' },
        },
        manager,
      },
    ]);
    expect(audit).toEqual([
      {
        ticketId: 'ticket-1',
        ticketLineId: 'line-1',
        shearId: 'shear-1',
        fromCents: 3500,
        toCents: 3000,
        reason: 'Regular shop',
        byUser: 'user-olive',
      },
    ]);
    expect(lineChanges).toEqual([{ overrideCents: 3000, overrideReason: 'Regular shop' }]);
  });

  it('refuses once money has been taken, and changes nothing', async () => {
    const { sut, calls } = setUp(openTicket, pricedLine, 1);
    await expect(sut.override(office, 'ticket-1', 'line-1', { cents: 1, reason: 'Late' })).rejects.toThrow(DomainError);
    expect(calls).toEqual([]);
  });
});

describe('TicketsService.updateLine', () => {
  it('on a finished ticket records only a hand-back', async () => {
    const finished = { ...openTicket, status: 'finished' as const };
    const { sut, lineChanges } = setUp(finished, { ...pricedLine, benchStatus: 'ready' });
    await expect(sut.updateLine(office, 'ticket-1', 'line-1', { notes: 'x' })).rejects.toThrow('finished');
    await sut.updateLine(office, 'ticket-1', 'line-1', { benchStatus: 'handed-back' });
    expect(lineChanges).toEqual([{ benchStatus: 'handed-back' }]);
  });

  it('prices again only when the add-ons change', async () => {
    const { sut, calls } = setUp(openTicket, pricedLine);
    await sut.updateLine(office, 'ticket-1', 'line-1', { benchStatus: 'on-the-bench', notes: 'chip near tip' });
    expect(calls).toEqual(['update line']);
    await sut.updateLine(office, 'ticket-1', 'line-1', { addOns: ['blade-polish'] });
    expect(calls).toEqual(['update line', 'update line', 'reprice']);
  });
});

describe('booked pairs', () => {
  it('adds up the items by kind, and a shear of that kind takes one off', () => {
    const pairs = expectedPairs([
      { tool_kind: 'thinning', edge_type: 'beveled', count: 2, shear_id: null },
      { tool_kind: 'straight', edge_type: 'convex', count: 1, shear_id: null },
      { tool_kind: 'thinning', edge_type: 'beveled', count: 1, shear_id: null },
      { tool_kind: 'spoon', edge_type: 'beveled', count: 1, shear_id: null },
    ]);
    expect(pairs).toEqual([
      { toolKind: 'thinning', edgeType: 'beveled', count: 3 },
      { toolKind: 'straight', edgeType: 'convex', count: 1 },
    ]);
    expect(takeExpected(pairs, { toolKind: 'straight', edgeType: 'convex' })).toEqual([pairs[0]]);
    expect(takeExpected(pairs, { toolKind: 'thinning', edgeType: 'beveled' })[0]!.count).toBe(2);
    expect(takeExpected(pairs, { toolKind: 'curved', edgeType: 'beveled' })).toEqual(pairs);
  });
});
