import type { INestApplication } from '@nestjs/common';
import type { Role } from '@keenroute/shared';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import type { ActorName } from '../utils/invoice-fixtures';
import { binary } from '../utils/binary';
import { allRoutes, routeName } from '../utils/security/routes';
import { twoSides, type Side } from '../utils/security/two-sides';
import { createTestApp } from '../utils/test-app';

/** Routes a role's rule admits that name a record in their path: reads (GET) or changes (anything else). */
function reachableById(role: Role, what: 'reads' | 'changes'): string[] {
  return allRoutes()
    .filter((route) => route.rule.kind === 'roles' && route.rule.roles.includes(role) && route.path.includes(':'))
    .filter((route) => (route.verb === 'get') === (what === 'reads'))
    .map(routeName)
    .sort();
}

/**
 * Per-record access: with two customers (each with their client login) on two sharpeners' route days, every record a
 * client or a sharpener can reach by id answers 404 to the other side, lists leave it out, and a sharpener's work on the
 * other side's records is refused with nothing changed. What each role may see is the one in server/src/access.
 */
describe('per-record access (e2e)', () => {
  let app: INestApplication<App>;
  let fixture: Awaited<ReturnType<typeof twoSides>>;
  const http = () => request(app.getHttpServer());
  const get = (who: ActorName, path: string) => http().get(path).set(fixture.actors.as(who)).buffer(true).parse(binary);
  const json = async (who: ActorName, path: string) =>
    (await http().get(path).set(fixture.actors.as(who)).expect(200)).body as unknown;

  /**
   * Each side gets 404 for the other side's record and reads its own; a PDF is read on side A only, since drawing one
   * takes seconds and the refusals are the point.
   */
  async function ownOnly(mine: ActorName, theirs: ActorName, path: (side: Side) => string) {
    const { a, b } = fixture;
    const bothOwn = !path(a).endsWith('/pdf');
    const answers: Record<string, number> = {
      [`${mine} own`]: (await get(mine, path(a))).status,
      [`${mine} other`]: (await get(mine, path(b))).status,
      [`${theirs} other`]: (await get(theirs, path(a))).status,
    };
    const expected: Record<string, number> = { [`${mine} own`]: 200, [`${mine} other`]: 404, [`${theirs} other`]: 404 };
    if (bothOwn) {
      answers[`${theirs} own`] = (await get(theirs, path(b))).status;
      expected[`${theirs} own`] = 200;
    }
    expect(answers).toEqual(expected);
  }

  /** A list shows a side its own record and never the other side's. */
  async function listsOwnOnly(mine: ActorName, theirs: ActorName, path: string, id: (side: Side) => string) {
    const ids = async (who: ActorName) =>
      ((await json(who, path)) as { items: { id: string }[] }).items.map((item) => item.id);
    const mineSees = await ids(mine);
    const theirsSee = await ids(theirs);
    expect(mineSees).toContain(id(fixture.a));
    expect(mineSees).not.toContain(id(fixture.b));
    expect(theirsSee).toContain(id(fixture.b));
    expect(theirsSee).not.toContain(id(fixture.a));
  }

  beforeAll(async () => {
    app = await createTestApp();
    fixture = await twoSides(app);
  });
  afterAll(async () => {
    await app.close();
  });

  describe('a client', () => {
    const reads: [string, (side: Side) => string][] = [
      ['GET /api/customers/:id', (s) => `/api/customers/${s.customerId}`],
      ['GET /api/shears/:id', (s) => `/api/shears/${s.shearId}`],
      ['GET /api/shears/by-tag/:tagCode', (s) => `/api/shears/by-tag/${s.tagCode}`],
      ['GET /api/shears/:id/photos/:photoId', (s) => `/api/shears/${s.shearId}/photos/${s.photoId}`],
      [
        'GET /api/shears/:id/photos/:photoId/thumbnail',
        (s) => `/api/shears/${s.shearId}/photos/${s.photoId}/thumbnail`,
      ],
      ['GET /api/tickets/:id', (s) => `/api/tickets/${s.ticketId}`],
      ['GET /api/invoices/:id', (s) => `/api/invoices/${s.invoiceId}`],
      ['GET /api/invoices/:id/pdf', (s) => `/api/invoices/${s.invoiceId}/pdf`],
      ['GET /api/statements/customers/:id', (s) => `/api/statements/customers/${s.customerId}`],
      ['GET /api/bookings/:id', (s) => `/api/bookings/${s.bookingId}`],
    ];
    it.each(reads)("%s: their own 200, the other customer's 404", (_route, path) =>
      ownOnly('client', 'otherClient', path),
    );

    it('covers every route a client reaches by id', () => {
      const covered = [...reads.map(([route]) => route), 'GET /api/statements/stops/:id'];
      expect(covered.sort()).toEqual(reachableById('client', 'reads'));
      expect(reachableById('client', 'changes')).toEqual([]);
    });

    const lists: [string, (side: Side) => string][] = [
      ['/api/customers', (s) => s.customerId],
      ['/api/shears', (s) => s.shearId],
      ['/api/tickets', (s) => s.ticketId],
      ['/api/invoices', (s) => s.invoiceId],
      ['/api/bookings', (s) => s.bookingId],
    ];
    it.each(lists)('GET %s lists their own and not the other customer', (path, id) =>
      listsOwnOnly('client', 'otherClient', path, id),
    );

    it("cannot reach the other customer's photo through their own shear's path", async () => {
      const { a, b } = fixture;
      expect((await get('client', `/api/shears/${a.shearId}/photos/${b.photoId}`)).status).toBe(404);
      expect((await get('client', `/api/shears/${a.shearId}/photos/${b.photoId}/thumbnail`)).status).toBe(404);
      // Not even the office: a photo is only ever found under its own shear.
      expect((await get('office', `/api/shears/${a.shearId}/photos/${b.photoId}`)).status).toBe(404);
    });

    it("gets no statement for a stop they do not manage, theirs or the other customer's", async () => {
      for (const side of [fixture.a, fixture.b]) {
        expect((await get('client', `/api/statements/stops/${side.stopId}`)).status).toBe(404);
      }
    });
  });

  describe('a sharpener', () => {
    const reads: [string, (side: Side) => string][] = [
      ['GET /api/stops/:id', (s) => `/api/stops/${s.stopId}`],
      ['GET /api/stops/:id/visits', (s) => `/api/stops/${s.stopId}/visits`],
      ['GET /api/route-days/:id', (s) => `/api/route-days/${s.routeDayId}`],
      ['GET /api/route-days/:id/sheet', (s) => `/api/route-days/${s.routeDayId}/sheet`],
      ['GET /api/customers/:id', (s) => `/api/customers/${s.customerId}`],
      ['GET /api/shears/:id', (s) => `/api/shears/${s.shearId}`],
      ['GET /api/shears/by-tag/:tagCode', (s) => `/api/shears/by-tag/${s.tagCode}`],
      ['GET /api/shears/:id/photos/:photoId', (s) => `/api/shears/${s.shearId}/photos/${s.photoId}`],
      [
        'GET /api/shears/:id/photos/:photoId/thumbnail',
        (s) => `/api/shears/${s.shearId}/photos/${s.photoId}/thumbnail`,
      ],
      ['GET /api/tickets/:id', (s) => `/api/tickets/${s.ticketId}`],
      ['GET /api/invoices/:id', (s) => `/api/invoices/${s.invoiceId}`],
      ['GET /api/invoices/:id/pdf', (s) => `/api/invoices/${s.invoiceId}/pdf`],
      ['GET /api/bookings/:id', (s) => `/api/bookings/${s.bookingId}`],
    ];
    it.each(reads)("%s: their own route day's 200, another sharpener's 404", (_route, path) =>
      ownOnly('sharpener', 'otherSharpener', path),
    );

    const lists: [string, (side: Side) => string][] = [
      ['/api/stops', (s) => s.stopId],
      ['/api/customers', (s) => s.customerId],
      ['/api/shears', (s) => s.shearId],
      ['/api/tickets', (s) => s.ticketId],
      ['/api/invoices', (s) => s.invoiceId],
      ['/api/bookings', (s) => s.bookingId],
    ];
    it.each(lists)("GET %s lists their own route days' and not another sharpener's", (path, id) =>
      listsOwnOnly('sharpener', 'otherSharpener', path, id),
    );

    /** Each change a sharpener may make, aimed at side B's records; the answer the refusal must be. */
    const changes = (a: Side, b: Side): [string, number, (as: Record<string, string>) => request.Test][] => [
      [
        'PATCH /api/stops/:id/access-notes',
        404,
        (as) => http().patch(`/api/stops/${b.stopId}/access-notes`).set(as).send({ accessDoor: 'Back' }),
      ],
      [
        'POST /api/route-days/:id/stops',
        404,
        (as) => http().post(`/api/route-days/${b.routeDayId}/stops`).set(as).send({ stopId: a.stopId, position: 0 }),
      ],
      [
        'POST /api/route-days/:id/stops/:stopId/lock',
        404,
        (as) => http().post(`/api/route-days/${b.routeDayId}/stops/${b.stopId}/lock`).set(as).send({}),
      ],
      [
        'POST /api/route-days/:id/stops/:stopId/unlock',
        404,
        (as) => http().post(`/api/route-days/${b.routeDayId}/stops/${b.stopId}/unlock`).set(as).send({}),
      ],
      [
        'POST /api/tickets',
        404,
        (as) =>
          http()
            .post('/api/tickets')
            .set(as)
            .send({ customerId: b.customerId, routeDayId: b.routeDayId, kind: 'visit' }),
      ],
      // A walk-up elsewhere is refused before its new customer is saved.
      [
        'POST /api/tickets/walk-up',
        403,
        (as) =>
          http()
            .post('/api/tickets/walk-up')
            .set(as)
            .send({ stopId: b.stopId, routeDayId: b.routeDayId, customer: { name: 'Walk-up Elsewhere' } }),
      ],
      [
        'POST /api/tickets/:id/lines',
        404,
        (as) => http().post(`/api/tickets/${b.ticketId}/lines`).set(as).send({ shearId: b.shearId, addOns: [] }),
      ],
      [
        'PATCH /api/tickets/:id/lines/:lineId',
        404,
        (as) => http().patch(`/api/tickets/${b.ticketId}/lines/${b.lineId}`).set(as).send({ benchStatus: 'ready' }),
      ],
      [
        'DELETE /api/tickets/:id/lines/:lineId',
        404,
        (as) => http().delete(`/api/tickets/${b.ticketId}/lines/${b.lineId}`).set(as),
      ],
      [
        'POST /api/tickets/:id/lines/:lineId/photos',
        404,
        (as) =>
          http()
            .post(`/api/tickets/${b.ticketId}/lines/${b.lineId}/photos`)
            .set(as)
            .field('stage', 'before')
            .attach('photo', Buffer.from('x'), 'x.png'),
      ],
      ['POST /api/tickets/:id/finish', 404, (as) => http().post(`/api/tickets/${b.ticketId}/finish`).set(as)],
      ['POST /api/tickets/:id/hand-back', 404, (as) => http().post(`/api/tickets/${b.ticketId}/hand-back`).set(as)],
      [
        'POST /api/tickets/:id/payments',
        404,
        (as) => http().post(`/api/tickets/${b.ticketId}/payments`).set(as).send({ method: 'cash', amountCents: 100 }),
      ],
      [
        'POST /api/tickets/:id/settle',
        404,
        (as) => http().post(`/api/tickets/${b.ticketId}/settle`).set(as).send({ settlement: 'to-invoice' }),
      ],
      [
        'POST /api/invoices/:id/payments',
        404,
        (as) => http().post(`/api/invoices/${b.invoiceId}/payments`).set(as).send({ method: 'cash', amountCents: 100 }),
      ],
      [
        'POST /api/shears/:id/photos',
        404,
        (as) => http().post(`/api/shears/${b.shearId}/photos`).set(as).attach('photo', Buffer.from('x'), 'x.png'),
      ],
      ['POST /api/bookings/:id/check-in', 404, (as) => http().post(`/api/bookings/${b.bookingId}/check-in`).set(as)],
    ];

    it('covers every route a sharpener reaches by id', () => {
      expect(reads.map(([route]) => route).sort()).toEqual(reachableById('sharpener', 'reads'));
      const tried = changes(fixture.a, fixture.b).map(([route]) => route);
      expect(reachableById('sharpener', 'changes').filter((route) => !tried.includes(route))).toEqual([]);
    });

    it("is refused every change to another sharpener's records, and nothing changes", async () => {
      const { a, b } = fixture;
      const snapshot = async () => ({
        stop: await json('office', `/api/stops/${b.stopId}`),
        day: await json('office', `/api/route-days/${b.routeDayId}`),
        ticket: await json('office', `/api/tickets/${b.ticketId}`),
        invoice: await json('office', `/api/invoices/${b.invoiceId}`),
        shear: await json('office', `/api/shears/${b.shearId}`),
        rows: await app.get(DataSource).query<unknown[]>(
          `SELECT (SELECT count(*) FROM customers)::int AS customers, (SELECT count(*) FROM tickets)::int AS tickets,
                  (SELECT count(*) FROM shear_photos)::int AS photos`,
        ),
      });
      const before = await snapshot();
      const answers: Record<string, number> = {};
      const expected: Record<string, number> = {};
      for (const [route, refusal, attempt] of changes(a, b)) {
        answers[route] = (await attempt(fixture.actors.as('sharpener'))).status;
        expected[route] = refusal;
      }
      expect(answers).toEqual(expected);
      expect(await snapshot()).toEqual(before);
    });
  });
});
