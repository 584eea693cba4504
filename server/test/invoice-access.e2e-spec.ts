import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import type { App } from 'supertest/types';
import type { InvoiceDto, InvoiceSummaryDto } from '../src/invoices/dto/invoice-response.dto';
import {
  createCustomer,
  createInvoice,
  createIssuedInvoice,
  createRouteDay,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  type ActorName,
} from './utils/invoice-fixtures';
import { createTestApp, createUser, signIn } from './utils/test-app';

/**
 * Who sees and does what with invoices: owner and office everything; a sharpener reads the issued invoices that bill
 * tickets on their own route days; a client their own (a shop manager the shop's); anything else answers 404 as if it
 * did not exist, and changing invoices is the office's alone.
 */
describe('invoice access (e2e)', () => {
  let app: INestApplication<App>;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let managerToken: string;
  const http = () => request(app.getHttpServer());
  const invoice = {
    mine: {} as InvoiceDto,
    draft: {} as InvoiceDto,
    elsewhere: {} as InvoiceDto,
    shop: {} as InvoiceDto,
  };
  const read = (who: ActorName, id: string) => http().get(`/api/invoices/${id}`).set(actors.as(who));
  const listed = async (token: string) =>
    (
      (
        await http()
          .get('/api/invoices')
          .query({ pageSize: 100 })
          .set({ Authorization: `Bearer ${token}` })
          .expect(200)
      ).body.items as InvoiceSummaryDto[]
    ).map((item) => item.id);

  beforeAll(async () => {
    app = await createTestApp();
    actors = await invoiceActors(app);
    const office = actors.tokens.office;
    await ensureRateCard(app, actors.tokens.owner);
    const manager = await createUser(app, 'client');
    managerToken = (await signIn(app, manager.email)).token;

    const near = await createStop(app, office, { name: 'Route Salon', taxRateBp: 825 });
    const far = await createStop(app, office, { name: 'Far Salon', taxRateBp: 600 });
    const shop = await createStop(app, office, {
      name: 'Managed Barbers',
      billingMode: 'stop',
      managerUserId: manager.id,
    });
    const myDay = await createRouteDay(app, actors.ids.sharpener, [near.id, shop.id]);
    const otherDay = await createRouteDay(app, actors.ids.otherSharpener, [far.id]);
    const mine = await createCustomer(app, office, { stopId: near.id, userId: actors.ids.client });
    const theirs = await createCustomer(app, office, { stopId: far.id, userId: actors.ids.otherClient });
    const staff = await createCustomer(app, office, { stopId: shop.id });
    const ticket = (customerId: string, routeDayId: string) =>
      createToInvoiceTicket(app, office, { customerId, routeDayId });

    invoice.mine = await createIssuedInvoice(app, office, [(await ticket(mine.id, myDay)).id]);
    invoice.draft = await createInvoice(app, office, [(await ticket(mine.id, myDay)).id]);
    invoice.elsewhere = await createIssuedInvoice(app, office, [(await ticket(theirs.id, otherDay)).id]);
    invoice.shop = await createIssuedInvoice(app, actors.tokens.owner, [(await ticket(staff.id, myDay)).id]);
  });
  afterAll(async () => {
    await app.close();
  });

  it('lets owner and office read everything, drafts included', async () => {
    for (const who of ['owner', 'office'] as const) {
      for (const one of Object.values(invoice)) await read(who, one.id).expect(200);
      const ids = await listed(actors.tokens[who]);
      expect(ids).toEqual(expect.arrayContaining(Object.values(invoice).map((one) => one.id)));
    }
    await http().get('/api/invoices/ready').set(actors.as('owner')).expect(200);
  });

  it('shows a sharpener the issued invoices of their own route days only', async () => {
    expect((await read('sharpener', invoice.mine.id).expect(200)).body).toMatchObject({ number: invoice.mine.number });
    await read('sharpener', invoice.shop.id).expect(200);
    await read('sharpener', invoice.draft.id).expect(404);
    await read('sharpener', invoice.elsewhere.id).expect(404);
    expect((await listed(actors.tokens.sharpener)).sort()).toEqual([invoice.mine.id, invoice.shop.id].sort());
    await read('otherSharpener', invoice.elsewhere.id).expect(200);
    await read('otherSharpener', invoice.mine.id).expect(404);
    expect(await listed(actors.tokens.otherSharpener)).toEqual([invoice.elsewhere.id]);
  });

  it("shows a client their own issued invoices, a shop manager the shop's, and nobody else's", async () => {
    await read('client', invoice.mine.id).expect(200);
    await read('client', invoice.draft.id).expect(404);
    await read('client', invoice.elsewhere.id).expect(404);
    await read('client', invoice.shop.id).expect(404);
    expect(await listed(actors.tokens.client)).toEqual([invoice.mine.id]);
    await read('otherClient', invoice.mine.id).expect(404);
    expect(await listed(actors.tokens.otherClient)).toEqual([invoice.elsewhere.id]);
    await http()
      .get(`/api/invoices/${invoice.shop.id}`)
      .set({ Authorization: `Bearer ${managerToken}` })
      .expect(200);
    expect(await listed(managerToken)).toEqual([invoice.shop.id]);
  });

  it('keeps every change to the owner and office', async () => {
    for (const who of ['sharpener', 'client'] as const) {
      const as = actors.as(who);
      const id = invoice.mine.id;
      await http().get('/api/invoices/ready').set(as).expect(403);
      await http()
        .post('/api/invoices')
        .set(as)
        .send({ ticketIds: [invoice.mine.tickets[0]!.id] })
        .expect(403);
      await http().patch(`/api/invoices/${invoice.draft.id}`).set(as).send({ version: 1 }).expect(403);
      await http().delete(`/api/invoices/${invoice.draft.id}`).set(as).expect(403);
      await http().post(`/api/invoices/${invoice.draft.id}/issue`).set(as).expect(403);
      await http().post(`/api/invoices/${id}/void`).set(as).send({ reason: 'Not mine to void' }).expect(403);
      await http()
        .post(`/api/invoices/${id}/credit-notes`)
        .set(as)
        .send({ amountCents: 100, reason: 'Not mine to credit', refundMethod: 'none' })
        .expect(403);
    }
    await http().get('/api/invoices').expect(401);
    // The refusals changed nothing.
    expect((await read('office', invoice.draft.id).expect(200)).body).toMatchObject({ status: 'draft' });
    expect((await read('office', invoice.mine.id).expect(200)).body).toMatchObject({ status: 'sent', creditNotes: [] });
  });
});
