/**
 * Two of everything a client or a sharpener can reach, one per side: side A is `client`'s customer at a stop on
 * `sharpener`'s route day, side B is `otherClient`'s at a stop on `otherSharpener`'s. Each side has a shear with a photo,
 * a finished ticket, an issued invoice and a booking, so every per-record check can ask for the other side's.
 */
import type { INestApplication } from '@nestjs/common';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import sharp from 'sharp';
import request from 'supertest';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import {
  businessToday,
  createCustomer,
  createIssuedInvoice,
  createRouteDay,
  createStop,
  createToInvoiceTicket,
  ensureRateCard,
  invoiceActors,
} from '../invoice-fixtures';

export interface Side {
  stopId: string;
  routeDayId: string;
  customerId: string;
  shearId: string;
  tagCode: string;
  photoId: string;
  ticketId: string;
  lineId: string;
  invoiceId: string;
  bookingId: string;
}

async function addBooking(app: INestApplication<App>, side: Omit<Side, 'bookingId'>, email: string) {
  const [row] = await app.get(DataSource).query<{ id: string }[]>(
    `INSERT INTO bookings (stop_id, route_day_id, day, name, email, phone, consent, customer_id, manage_token_hash,
       idempotency_key, bench_minutes)
     VALUES ($1, $2, $3, 'Side booking', $4, '555-0100', true, $5, $6, $7, 20) RETURNING id`,
    [
      side.stopId,
      side.routeDayId,
      businessToday(app),
      email,
      side.customerId,
      createHash('sha256').update(randomBytes(32)).digest('hex'),
      randomUUID(),
    ],
  );
  return row!.id;
}

export async function twoSides(app: INestApplication<App>) {
  const actors = await invoiceActors(app);
  const office = actors.tokens.office;
  await ensureRateCard(app, actors.tokens.owner);
  const png = await sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 40, g: 90, b: 60 } } })
    .png()
    .toBuffer();

  const side = async (sharpenerId: string, clientId: string, clientEmail: string): Promise<Side> => {
    const stop = await createStop(app, office, { name: 'Side Salon' });
    const routeDayId = await createRouteDay(app, sharpenerId, [stop.id]);
    const customer = await createCustomer(app, office, { stopId: stop.id, userId: clientId });
    const ticket = await createToInvoiceTicket(app, office, { customerId: customer.id, routeDayId });
    const line = ticket.lines[0]!;
    const invoice = await createIssuedInvoice(app, office, [ticket.id]);
    const photo = await request(app.getHttpServer())
      .post(`/api/shears/${line.shear.id}/photos`)
      .set(actors.as('office'))
      .attach('photo', png, { filename: 'shear.png', contentType: 'image/png' })
      .expect(201);
    const made = {
      stopId: stop.id,
      routeDayId,
      customerId: customer.id,
      shearId: line.shear.id,
      tagCode: line.shear.tagCode,
      photoId: photo.body.id as string,
      ticketId: ticket.id,
      lineId: line.id,
      invoiceId: invoice.id,
    };
    return { ...made, bookingId: await addBooking(app, made, clientEmail) };
  };

  const a = await side(actors.ids.sharpener, actors.ids.client, actors.emails.client);
  const b = await side(actors.ids.otherSharpener, actors.ids.otherClient, actors.emails.otherClient);
  return { actors, a, b };
}
