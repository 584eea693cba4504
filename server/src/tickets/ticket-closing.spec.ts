import type { DataSource } from 'typeorm';
import type { TicketAccess } from '../access/ticket-access';
import type { Actor } from '../auth/actor';
import { ShearHistoryEntry } from '../shears/entities/shear-history-entry.entity';
import { Shear } from '../shears/entities/shear.entity';
import type { BenchStatus } from './bench-status';
import { TicketLine } from './entities/ticket-line.entity';
import { Ticket } from './entities/ticket.entity';
import { servicedSummary, TicketClosing } from './ticket-closing';
import type { TicketReader } from './ticket-reader';
import type { TicketWriter } from './ticket-writer';

const sharpener: Actor = { id: 'user-sam', email: 's@x.test', name: 'Sam', role: 'sharpener' };
const shears: Partial<Shear>[] = [
  { id: 'shear-1', edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5 },
  { id: 'shear-2', edgeType: 'beveled', toolKind: 'thinning', lengthIn: 7 },
];

function setUp(statuses: BenchStatus[], ticketStatus: Ticket['status'] = 'open') {
  const ticket = { id: 'ticket-1', status: ticketStatus, visitDay: '2026-12-09' } as Ticket;
  const lines = statuses.map(
    (benchStatus, index) =>
      ({
        id: `line-${index}`,
        ticketId: ticket.id,
        shearId: shears[index]!.id,
        addOns: index === 1 ? ['tension-adjustment'] : [],
        benchStatus,
      }) as TicketLine,
  );
  const history: Partial<ShearHistoryEntry>[] = [];
  const calls: string[] = [];
  const manager = {
    getRepository: (entity: unknown) => {
      if (entity === Shear) return { findBy: () => Promise.resolve(shears) };
      if (entity === ShearHistoryEntry) {
        return {
          insert: (rows: Partial<ShearHistoryEntry>[]) => {
            calls.push('history');
            history.push(...rows);
            return Promise.resolve();
          },
        };
      }
      if (entity === Ticket) {
        return {
          save: (row: Ticket) => {
            calls.push(`save ${row.status}`);
            return Promise.resolve(row);
          },
        };
      }
      if (entity === TicketLine) {
        return {
          findBy: () => Promise.resolve(lines),
          update: (where: { benchStatus: BenchStatus }, change: { benchStatus: BenchStatus }) => {
            for (const line of lines) if (line.benchStatus === where.benchStatus) line.benchStatus = change.benchStatus;
            calls.push('hand back lines');
            return Promise.resolve();
          },
        };
      }
      throw new Error('unexpected repository');
    },
  };
  const dataSource = { transaction: (work: (m: typeof manager) => Promise<unknown>) => work(manager) };
  const access = { requireTicket: jest.fn(() => Promise.resolve(ticket)) } as unknown as TicketAccess;
  const writer = {
    lock: () => Promise.resolve(ticket),
    lines: () => Promise.resolve(lines),
    reprice: () => {
      calls.push('reprice');
      return Promise.resolve();
    },
  } as unknown as TicketWriter;
  const reader = { detail: (id: string) => Promise.resolve({ id }) } as unknown as TicketReader;
  const sut = new TicketClosing(dataSource as unknown as DataSource, access, writer, reader);
  return { sut, ticket, lines, history, calls, access };
}

describe('TicketClosing.finish', () => {
  it('prices the ticket a last time and writes one serviced row per shear, with the ticket and visit day', async () => {
    const { sut, ticket, history, calls, access } = setUp(['ready', 'handed-back']);
    await sut.finish(sharpener, 'ticket-1');
    expect(access.requireTicket).toHaveBeenCalledWith(sharpener, 'ticket-1', 'work');
    expect(calls).toEqual(['reprice', 'history', 'save finished']);
    expect(history).toEqual([
      expect.objectContaining({
        shearId: 'shear-1',
        kind: 'serviced',
        ticketId: 'ticket-1',
        happenedOn: '2026-12-09',
        summary: 'Sharpened: convex straight, 6.5 in',
        recordedBy: 'user-sam',
      }),
      expect.objectContaining({
        shearId: 'shear-2',
        summary: 'Sharpened: beveled thinning, 7 in; tension/pivot adjustment',
      }),
    ]);
    expect(ticket.status).toBe('finished');
    expect(ticket.finishedAt).toBeInstanceOf(Date);
  });

  it('refuses while a pair is not ready, and writes nothing', async () => {
    const { sut, history } = setUp(['ready', 'on-the-bench']);
    await expect(sut.finish(sharpener, 'ticket-1')).rejects.toThrow('1 pair is not ready yet');
    expect(history).toEqual([]);
  });

  it('refuses a ticket that is already finished', async () => {
    const { sut } = setUp(['ready'], 'finished');
    await expect(sut.finish(sharpener, 'ticket-1')).rejects.toThrow('already finished');
  });
});

describe('TicketClosing.handBack', () => {
  it('finishes an open ticket on the way, then hands back every pair and the ticket', async () => {
    const { sut, ticket, lines, calls } = setUp(['ready', 'ready']);
    await sut.handBack(sharpener, 'ticket-1');
    expect(calls).toEqual(['reprice', 'history', 'save finished', 'hand back lines', 'save handed-back']);
    expect(lines.map((line) => line.benchStatus)).toEqual(['handed-back', 'handed-back']);
    expect(ticket.handedBackAt).toBeInstanceOf(Date);
  });

  it('hands back a finished ticket without writing its history twice', async () => {
    const { sut, calls } = setUp(['ready'], 'finished');
    await sut.handBack(sharpener, 'ticket-1');
    expect(calls).toEqual(['hand back lines', 'save handed-back']);
  });
});

describe('servicedSummary', () => {
  it('names the edge type, tool kind and length, then the add-ons', () => {
    expect(servicedSummary({ edgeType: 'semi-convex', toolKind: 'curved', lengthIn: 5.5 }, ['blade-polish'])).toBe(
      'Sharpened: semi-convex curved, 5.5 in; blade polish',
    );
  });
});
