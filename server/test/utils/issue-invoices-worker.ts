/**
 * A second (and third) server process for the numbering test: boots the real app context against the test database,
 * waits for the parent's "go", then creates and issues one invoice per ticket it was given, as fast as it can, through
 * the same InvoicesService the API uses. Run with ts-node (see invoice-numbering.e2e-spec.ts); speaks over fork IPC.
 */
import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { Actor } from '../../src/auth/actor';
import { AppModule } from '../../src/app.module';
import { InvoicesService } from '../../src/invoices/invoices.service';

export interface WorkerJob {
  actor: Actor;
  ticketIds: string[];
}
export type WorkerMessage = { ready: true } | { numbers: string[] } | { error: string };

/** Resolves once the message is handed to the channel, so exiting right after does not drop it. */
const send = (message: WorkerMessage) =>
  new Promise<void>((resolve) => (process.send ? process.send(message, () => resolve()) : resolve()));

async function main(): Promise<void> {
  const job = JSON.parse(process.env.ISSUE_WORKER_JOB ?? '{}') as WorkerJob;
  const app = await NestFactory.createApplicationContext(AppModule, { logger: false });
  try {
    const invoices = app.get(InvoicesService);
    const go = new Promise<void>((resolve) => process.once('message', () => resolve()));
    await send({ ready: true });
    await go;
    const numbers: string[] = [];
    for (const ticketId of job.ticketIds) {
      const draft = await invoices.create(job.actor, { ticketIds: [ticketId] });
      const issued = await invoices.issue(job.actor, draft.id);
      numbers.push(issued.number!);
    }
    await send({ numbers });
  } finally {
    await app.close();
  }
}

// Letting go of the IPC channel is what lets the worker end on its own once the app has closed.
main().then(
  () => process.disconnect?.(),
  async (error: unknown) => {
    await send({ error: error instanceof Error ? (error.stack ?? error.message) : String(error) });
    process.exitCode = 1;
    process.disconnect?.();
  },
);
