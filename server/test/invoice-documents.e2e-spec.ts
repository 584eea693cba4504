import type { INestApplication } from '@nestjs/common';
import { formatMoney } from '@keenroute/shared';
import { simpleParser } from 'mailparser';
import sharp from 'sharp';
import request from 'supertest';
import type { App } from 'supertest/types';
import type { BusinessProfileDto } from '../src/invoices/documents/dto/business-profile.dto';
import type { InvoiceDto } from '../src/invoices/dto/invoice-response.dto';
import { InvoicePayLink } from '../src/invoices/invoice-pay-link';
import {
  createCustomer,
  createInvoice,
  createRouteDay,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
  issueInvoice,
  type ActorName,
  type CustomerRef,
  type StopRef,
  type TicketShear,
} from './utils/invoice-fixtures';
import { eventually } from './utils/faults/fault-fixtures';
import { waitForMail } from './utils/mail-catcher';
import { createTestApp } from './utils/test-app';
import { binary, pdfText } from './utils/binary';

const PROFILE = {
  name: 'Larkhaven Edge Works (demo)',
  street: '8 Whetstone Lane',
  city: 'Larkhaven',
  region: 'LS',
  postalCode: '55901',
  country: 'US',
  phone: '555-0142',
  email: 'office@edgeworks.demo.test',
  website: 'https://edgeworks.demo.test',
  taxId: '41-7788123',
  invoiceFooter: 'Invented demo business. Thank you for keeping your shears sharp.',
  paymentTermsDays: 14,
  reminderDays: [7, 21, 45],
};

/** Pictures drawn in the PDF: image objects, less the transparency masks pdfkit writes as images of their own. */
const imageCount = (pdf: Buffer) => {
  const bytes = pdf.toString('latin1');
  return (bytes.match(/\/Subtype \/Image/g)?.length ?? 0) - (bytes.match(/\/SMask \d+ 0 R/g)?.length ?? 0);
};
const money = (cents: number) => formatMoney(cents, 'USD');

/**
 * Invoices as documents: the business profile and its logo, the PDF read back with a PDF text extractor, e-mailing it
 * with the PDF attached (the raw message parsed with mailparser), resends and failures in the send log, who may do what.
 */
describe('invoice documents (e2e)', () => {
  let app: INestApplication<App>;
  let actors: Awaited<ReturnType<typeof invoiceActors>>;
  let original: BusinessProfileDto;
  let salon: StopRef;
  let wren: CustomerRef;
  let routeDayId: string;
  const http = () => request(app.getHttpServer());
  const as = (who: ActorName) => actors.as(who);

  /** The invoice once its e-mail is delivered: sending queues it, and "sent on" is set when the relay took it. */
  const delivered = (invoiceId: string) =>
    eventually('the invoice e-mail to be delivered', async () => {
      const read = await http().get(`/api/invoices/${invoiceId}`).set(as('office')).expect(200);
      const invoice = read.body as InvoiceDto;
      return invoice.sentAt ? invoice : undefined;
    });
  /** The send log once it has `count` rows and the queue has tried every one. */
  const sendLog = (invoiceId: string, count: number) =>
    eventually('the send log to settle', async () => {
      const log = await http().get(`/api/invoices/${invoiceId}/mails`).set(as('office')).expect(200);
      const rows = log.body as { status: string }[];
      return rows.length === count && rows.every((row) => row.status !== 'queued') ? log : undefined;
    });

  /** A draft of two tickets at the salon (8.25 %), on the sharpener's route day, for Wren unless said otherwise. */
  const draftFor = async (customer: CustomerRef = wren, extra: { discountBp?: number } = {}) => {
    const tickets = [];
    const pairs: TicketShear[][] = [[{}, { lengthIn: 7.5, edgeType: 'beveled' }], [{}]];
    for (const shears of pairs) {
      tickets.push(
        await createToInvoiceTicket(app, actors.tokens.office, {
          customerId: customer.id,
          stopId: salon.id,
          routeDayId,
          shears,
        }),
      );
    }
    return createInvoice(
      app,
      actors.tokens.office,
      tickets.map((ticket) => ticket.id),
      extra,
    );
  };
  const issuedFor = async () => issueInvoice(app, actors.tokens.office, (await draftFor()).id);
  const pdfOf = async (path: string, who: ActorName | null = 'office') => {
    const call = http().get(path);
    const response = await (who ? call.set(as(who)) : call).buffer(true).parse(binary).expect(200);
    expect(response.headers['content-type']).toBe('application/pdf');
    const bytes = response.body as Buffer;
    return { response, bytes, text: await pdfText(bytes) };
  };

  beforeAll(async () => {
    app = await createTestApp();
    actors = await invoiceActors(app);
    await ensureRateCard(app, actors.tokens.owner);
    original = (await http().get('/api/business-profile').set(as('owner')).expect(200)).body as BusinessProfileDto;
    await http().put('/api/business-profile').set(as('owner')).send(PROFILE).expect(200);
    salon = await createStop(app, actors.tokens.office, { taxRateBp: 825, name: 'Pine Street Salon (demo)' });
    wren = await createCustomer(app, actors.tokens.office, { stopId: salon.id, userId: actors.ids.client });
    routeDayId = await createRouteDay(app, actors.ids.sharpener, [salon.id]);
  });

  afterAll(async () => {
    // The profile is one row every test file shares: leave it as it was found.
    await http().delete('/api/business-profile/logo').set(as('owner'));
    const fields: Partial<BusinessProfileDto> = { ...original };
    delete fields.logoUrl;
    await http().put('/api/business-profile').set(as('owner')).send(fields);
    await app.close();
  });

  describe('business profile', () => {
    it('is read and changed by the owner and the office, with each field checked', async () => {
      const read = await http().get('/api/business-profile').set(as('office')).expect(200);
      expect(read.body).toMatchObject({ ...PROFILE, logoUrl: null });
      const changed = await http()
        .put('/api/business-profile')
        .set(as('office'))
        .send({ paymentTermsDays: 30, reminderDays: [3, 10] })
        .expect(200);
      expect(changed.body).toMatchObject({ name: PROFILE.name, paymentTermsDays: 30, reminderDays: [3, 10] });

      const refused = async (body: Record<string, unknown>, field: string) => {
        const response = await http().put('/api/business-profile').set(as('office')).send(body).expect(400);
        expect(Object.keys(response.body.fields ?? {})).toContain(field);
      };
      await refused({ paymentTermsDays: 121 }, 'paymentTermsDays');
      await refused({ reminderDays: [21, 7] }, 'reminderDays');
      await refused({ reminderDays: [7, 7] }, 'reminderDays');
      await refused({ reminderDays: [] }, 'reminderDays');
      await refused({ reminderDays: [1, 2, 3, 4, 5, 6] }, 'reminderDays');
      await refused({ reminderDays: [366] }, 'reminderDays');
      await refused({ email: 'not an address' }, 'email');
      await refused({ country: 'USA' }, 'country');
      await refused({ name: '' }, 'name');
      await http().put('/api/business-profile').set(as('office')).send({ colour: 'teal' }).expect(400);
      await http().put('/api/business-profile').set(as('owner')).send(PROFILE).expect(200);
    });

    it('takes a logo (checked, made a PNG at most 600 px wide), shows it to every role and prints it', async () => {
      const draft = await draftFor();
      expect(imageCount((await pdfOf(`/api/invoices/${draft.id}/pdf`)).bytes)).toBe(0);

      const upload = (body: Buffer, filename: string, contentType: string) =>
        http().post('/api/business-profile/logo').set(as('office')).attach('logo', body, { filename, contentType });
      const notAPicture = await upload(Buffer.from('just some text'), 'logo.png', 'image/png').expect(400);
      expect(notAPicture.body.message).toMatch(/PNG, JPEG or WebP/);
      await upload(Buffer.alloc(2 * 1024 * 1024 + 1, 1), 'big.png', 'image/png').expect(413);

      const wide = await sharp({ create: { width: 1200, height: 300, channels: 3, background: '#1d5c63' } })
        .jpeg()
        .toBuffer();
      const stored = await upload(wide, 'logo.jpg', 'image/jpeg').expect(200);
      expect(stored.body.logoUrl).toMatch(/^\/api\/business-profile\/logo\?v=/);
      for (const who of ['owner', 'office', 'sharpener', 'client'] as const) {
        const logo = await http().get('/api/business-profile/logo').set(as(who)).buffer(true).parse(binary).expect(200);
        expect(logo.headers['content-type']).toBe('image/png');
        const meta = await sharp(logo.body as Buffer).metadata();
        expect([meta.format, meta.width, meta.height]).toEqual(['png', 600, 150]);
      }
      await http().get('/api/business-profile/logo').expect(401);
      expect(imageCount((await pdfOf(`/api/invoices/${draft.id}/pdf`)).bytes)).toBe(1);

      // A second upload replaces the first under a new address; removing it takes it off the invoice.
      const again = await upload(wide, 'logo.jpg', 'image/jpeg').expect(200);
      expect(again.body.logoUrl).not.toBe(stored.body.logoUrl);
      await http().delete('/api/business-profile/logo').set(as('office')).expect(204);
      await http().get('/api/business-profile/logo').set(as('office')).expect(404);
      expect((await http().get('/api/business-profile').set(as('office'))).body.logoUrl).toBeNull();
      expect(imageCount((await pdfOf(`/api/invoices/${draft.id}/pdf`)).bytes)).toBe(0);
      await upload(wide, 'logo.jpg', 'image/jpeg').expect(200);
    });
  });

  describe('the PDF', () => {
    it('prints the number, bill-to, each line, tax, total, balance and the pay link', async () => {
      const draft = await draftFor(wren, { discountBp: 1000 });
      const invoice = await issueInvoice(app, actors.tokens.office, draft.id);
      expect(invoice.payUrl).toBeTruthy();
      const { response, bytes, text } = await pdfOf(`/api/invoices/${invoice.id}/pdf`);
      expect(response.headers['content-disposition']).toContain(`filename="${invoice.number}.pdf"`);

      expect(text).toContain(`Invoice ${invoice.number}`);
      expect(text).toContain(PROFILE.name);
      expect(text).toContain(`Tax ID ${PROFILE.taxId}`);
      expect(text).toContain(invoice.billToName);
      expect(text).toContain(`Issue date ${invoice.issueDate}`);
      expect(text).toContain(`Due date ${invoice.dueDate}`);
      expect(invoice.lines.length).toBeGreaterThanOrEqual(3);
      // A long description wraps onto a second line in the PDF; its words are what matter.
      const flat = text.replace(/\s+/g, ' ');
      for (const line of invoice.lines) {
        expect(flat).toContain(line.description);
        expect(text).toContain(money(line.amountCents));
      }
      expect(text).toContain(`Discount (10 %) ${money(-invoice.discountTotalCents)}`);
      expect(text).toContain(`Subtotal ${money(invoice.subtotalCents)}`);
      for (const group of invoice.taxGroups) {
        expect(text).toContain(`Tax 8.25 % on ${money(group.taxableCents)} ${money(group.taxCents)}`);
      }
      expect(text).toContain(`Total ${money(invoice.totalCents)}`);
      expect(text).toContain(`Balance due ${money(invoice.balanceCents)}`);
      expect(text).toContain('Sales tax at 8.25 %');
      expect(text).toContain(PROFILE.invoiceFooter);
      // Extracted text may break a long link across lines; the characters are what matter.
      expect(text.replace(/\s+/g, '')).toContain(invoice.payUrl);
      // The pay link's QR code, and the logo when one is stored.
      const profile = (await http().get('/api/business-profile').set(as('office'))).body as BusinessProfileDto;
      expect(imageCount(bytes)).toBe(profile.logoUrl ? 2 : 1);

      // The pay link alone opens the same PDF, signed out; a forged one does not.
      const token = invoice.payUrl!.split('/pay/')[1]!;
      const open = await pdfOf(`/api/public/invoices/${token}/pdf`, null);
      expect(open.text).toContain(`Invoice ${invoice.number}`);
      await http()
        .get(`/api/public/invoices/${token.slice(0, -2)}xx/pdf`)
        .expect(404);
      await http().get('/api/public/invoices/not-a-token/pdf').expect(404);
    });

    it('prints a draft as "Draft invoice" without a pay link, and keeps it off the public link', async () => {
      const draft = await draftFor();
      const { text, response } = await pdfOf(`/api/invoices/${draft.id}/pdf`);
      expect(text).toContain('Draft invoice');
      expect(text).not.toContain('Pay online');
      expect(response.headers['content-disposition']).toContain('filename="draft-invoice-');
      const token = app.get(InvoicePayLink).token(draft.id);
      await http().get(`/api/public/invoices/${token}/pdf`).expect(404);
    });

    it('stamps a void invoice VOID with its reason, and a fully credited one PAID', async () => {
      const voided = await issuedFor();
      await http()
        .post(`/api/invoices/${voided.id}/void`)
        .set(as('office'))
        .send({ reason: 'Billed to the wrong salon (test)' })
        .expect(200);
      const voidText = (await pdfOf(`/api/invoices/${voided.id}/pdf`)).text;
      expect(voidText).toContain('VOID');
      expect(voidText).toContain('Billed to the wrong salon (test)');
      expect(voidText).toContain(`Balance due ${money(0)}`);
      expect(voidText).not.toContain('Pay online');

      const credited = await issuedFor();
      await http()
        .post(`/api/invoices/${credited.id}/credit-notes`)
        .set(as('office'))
        .send({ amountCents: credited.totalCents, reason: 'Test: goodwill for a late visit', refundMethod: 'none' })
        .expect(201);
      const paidText = (await pdfOf(`/api/invoices/${credited.id}/pdf`)).text;
      expect(paidText).toContain('PAID');
      expect(paidText).toMatch(/Credit note CN-\d{4}-\d{4}: Test: goodwill for a late visit/);
      expect(paidText).not.toContain('Pay online');
    });
  });

  describe('sending', () => {
    it('issues a draft and e-mails the PDF with the pay link; a resend writes a second log row', async () => {
      const draft = await draftFor();
      const sent = await http().post(`/api/invoices/${draft.id}/send`).set(as('office')).send({}).expect(202);
      const queued = sent.body as InvoiceDto;
      expect(queued.number).toMatch(/^KR-\d{4}-\d{4}$/);
      expect(queued.status).toBe('sent');

      const caught = await waitForMail(wren.email!, new RegExp(`Invoice ${queued.number} from`));
      const raw = await fetch(`${process.env.MAIL_CATCHER_URL}/messages/${caught.id}/raw`);
      const parsed = await simpleParser(Buffer.from(await raw.arrayBuffer()));
      expect(parsed.subject).toBe(`Invoice ${queued.number} from ${PROFILE.name}`);
      expect(parsed.text).toContain(queued.payUrl);
      expect(parsed.html || '').toContain(`href="${queued.payUrl}"`);
      expect(parsed.text).toContain(`Balance due: ${money(queued.balanceCents)}`);
      expect(parsed.attachments).toHaveLength(1);
      const [attachment] = parsed.attachments;
      expect(attachment!.filename).toBe(`${queued.number}.pdf`);
      expect(attachment!.contentType).toBe('application/pdf');
      const attached = await pdfText(attachment!.content);
      expect(attached).toContain(`Invoice ${queued.number}`);
      expect(attached).toContain(`Total ${money(queued.totalCents)}`);
      const invoice = await delivered(queued.id);

      const resent = await http()
        .post(`/api/invoices/${invoice.id}/send`)
        .set(as('owner'))
        .send({ to: 'Bookkeeper.Wren@e2e.keenroute.test' })
        .expect(202);
      expect(resent.body.number).toBe(invoice.number);
      await waitForMail('bookkeeper.wren@e2e.keenroute.test', new RegExp(`Invoice ${invoice.number} from`));
      const log = await sendLog(invoice.id, 2);
      expect((await delivered(invoice.id)).sentAt).toBe(invoice.sentAt); // the first send's date stays

      expect(log.body).toHaveLength(2);
      expect(log.body.map((row: { toEmail: string }) => row.toEmail)).toEqual([
        'bookkeeper.wren@e2e.keenroute.test',
        wren.email,
      ]);
      for (const row of log.body) {
        expect(row).toMatchObject({ kind: 'invoice', status: 'sent', error: null });
        expect(row.subject).toBe(`Invoice ${invoice.number} from ${PROFILE.name}`);
      }
    });

    it('refuses without an address (the draft stays a draft), a bad address, and a void invoice', async () => {
      const silent = await createCustomer(app, actors.tokens.office, { stopId: salon.id, email: null });
      const draft = await draftFor(silent);
      const response = await http().post(`/api/invoices/${draft.id}/send`).set(as('office')).send({}).expect(400);
      expect(response.body.message).toMatch(/no e-mail address/);
      expect((await http().get(`/api/invoices/${draft.id}`).set(as('office'))).body.status).toBe('draft');
      await http().post(`/api/invoices/${draft.id}/send`).set(as('office')).send({ to: 'nope' }).expect(400);

      const issued = await issuedFor();
      await http().post(`/api/invoices/${issued.id}/void`).set(as('office')).send({ reason: 'Test void' }).expect(200);
      await http().post(`/api/invoices/${issued.id}/send`).set(as('office')).send({}).expect(409);
    });
  });

  it('lets each role do only its part', async () => {
    const draft = await draftFor();
    const issued = await issuedFor();
    const pdf = (id: string, who: ActorName) => http().get(`/api/invoices/${id}/pdf`).set(as(who));

    for (const who of ['owner', 'office', 'sharpener', 'client'] as const) await pdf(issued.id, who).expect(200);
    await pdf(issued.id, 'otherSharpener').expect(404);
    await pdf(issued.id, 'otherClient').expect(404);
    await http().get(`/api/invoices/${issued.id}/pdf`).expect(401);
    for (const who of ['owner', 'office'] as const) await pdf(draft.id, who).expect(200);
    for (const who of ['sharpener', 'client'] as const) await pdf(draft.id, who).expect(404);

    for (const who of ['sharpener', 'client'] as const) {
      await http().post(`/api/invoices/${issued.id}/send`).set(as(who)).send({}).expect(403);
      await http().get(`/api/invoices/${issued.id}/mails`).set(as(who)).expect(403);
      await http().get('/api/business-profile').set(as(who)).expect(403);
      await http().put('/api/business-profile').set(as(who)).send({ name: 'Taken over' }).expect(403);
      await http().delete('/api/business-profile/logo').set(as(who)).expect(403);
      await http()
        .post('/api/business-profile/logo')
        .set(as(who))
        .attach('logo', Buffer.from('x'), { filename: 'x.png', contentType: 'image/png' })
        .expect(403);
    }
    await http().get('/api/business-profile').expect(401);
    await http().get(`/api/invoices/${issued.id}/mails`).set(as('owner')).expect(200);
  });
});
