import type { INestApplication } from '@nestjs/common';
import type { App } from 'supertest/types';
import { DataSource } from 'typeorm';
import { validateEnvironment } from '../../../src/config/environment';
import { todayIn } from '../../../src/stops/business-today';
import { TicketWriter } from '../../../src/tickets/ticket-writer';
import type { ApiInstance } from './api-instances';

/**
 * A running API instance in the shape the shared fixtures take (invoice-fixtures.ts, test-app.ts): their requests go
 * over HTTP to the instance's port (supertest takes a URL), and the two things they read from the app itself, the
 * database and the business's today, come from the test's own connection and the same configuration rules.
 */
export function instanceApp(instance: ApiInstance, db: DataSource): INestApplication<App> {
  const timeZone = validateEnvironment(process.env).BUSINESS_TIME_ZONE;
  const ticketWriter: Pick<TicketWriter, 'today'> = {
    today: () => todayIn(timeZone),
  };
  const providers = new Map<unknown, unknown>([
    [DataSource, db],
    [TicketWriter, ticketWriter],
  ]);
  const app = {
    getHttpServer: () => instance.url,
    get: (token: unknown) => {
      if (!providers.has(token)) throw new Error(`instanceApp has no ${String(token)}: add it if a fixture needs it.`);
      return providers.get(token);
    },
  };
  return app as unknown as INestApplication<App>;
}
