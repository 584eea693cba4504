import { randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { pathToFileURL } from 'node:url';
import { parseArgs } from 'node:util';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/**
 * The local stand-in for an SMTP relay: accepts every message on loopback, keeps the newest in memory and shows them
 * over a small JSON API, so sign-up and reset e-mails can be read in development and by the tests.
 */

export interface CaughtAttachment {
  filename: string | null;
  contentType: string;
  size: number;
}

export interface CaughtMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  date: string;
  text: string;
  html: string | null;
  attachments: CaughtAttachment[];
}

export interface MailCatcherOptions {
  /** 0 picks a free port. */
  smtpPort: number;
  /** 0 picks a free port. */
  httpPort: number;
  host?: '127.0.0.1';
  /** Oldest messages are dropped beyond this many. */
  limit?: number;
}

export interface MailCatcher {
  readonly smtpPort: number;
  readonly httpPort: number;
  readonly url: string;
  stop(): Promise<void>;
}

interface Stored {
  message: CaughtMessage;
  raw: Buffer;
}

function addressList(value: AddressObject | AddressObject[] | undefined): string[] {
  const groups = value === undefined ? [] : Array.isArray(value) ? value : [value];
  return groups.flatMap((group) =>
    group.value.map((entry) => entry.address ?? entry.name).filter((a): a is string => !!a),
  );
}

function listenError(error: NodeJS.ErrnoException, what: string, port: number): Error {
  if (error.code === 'EADDRINUSE') {
    return new Error(
      `Port ${port} on 127.0.0.1 is already taken, so the mail catcher's ${what} cannot start there.\n` +
        `  See what holds it:  ss -ltnp 'sport = :${port}'\n` +
        `  Stop that program, or choose another port (MAIL_CATCHER_SMTP_PORT / MAIL_CATCHER_HTTP_PORT).`,
    );
  }
  return error;
}

function sendJson(response: http.ServerResponse, status: number, body: unknown): void {
  response.writeHead(status, { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' });
  response.end(JSON.stringify(body));
}

export async function startMailCatcher(options: MailCatcherOptions): Promise<MailCatcher> {
  const host = options.host ?? '127.0.0.1';
  const limit = options.limit ?? 500;
  const stored: Stored[] = [];

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    banner: 'Keenroute local mail catcher (nothing leaves this machine)',
    size: 25 * 1024 * 1024,
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', callback);
      stream.on('end', () => {
        const raw = Buffer.concat(chunks);
        simpleParser(raw)
          .then((parsed) => {
            const envelopeTo = session.envelope.rcptTo.map((rcpt) => rcpt.address);
            const mailFrom = session.envelope.mailFrom;
            stored.unshift({
              raw,
              message: {
                id: randomUUID(),
                from: parsed.from?.text ?? (mailFrom ? mailFrom.address : ''),
                to: envelopeTo.length > 0 ? envelopeTo : addressList(parsed.to),
                subject: parsed.subject ?? '',
                date: (parsed.date ?? new Date()).toISOString(),
                text: parsed.text ?? '',
                html: typeof parsed.html === 'string' ? parsed.html : null,
                attachments: parsed.attachments.map((attachment) => ({
                  filename: attachment.filename ?? null,
                  contentType: attachment.contentType,
                  size: attachment.size,
                })),
              },
            });
            stored.splice(limit);
            callback();
          })
          .catch((error: Error) => callback(error));
      });
    },
  });

  const api = http.createServer((request, response) => {
    const url = new URL(request.url ?? '/', 'http://localhost');
    const rawMatch = /^\/messages\/([^/]+)\/raw$/.exec(url.pathname);
    if (request.method === 'GET' && url.pathname === '/messages') {
      sendJson(response, 200, { items: stored.map((entry) => entry.message), total: stored.length });
    } else if (request.method === 'DELETE' && url.pathname === '/messages') {
      stored.length = 0;
      response.writeHead(204).end();
    } else if (request.method === 'GET' && rawMatch) {
      const found = stored.find((entry) => entry.message.id === rawMatch[1]);
      if (!found) return sendJson(response, 404, { message: 'No caught message has that id.' });
      response.writeHead(200, {
        'content-type': 'message/rfc822',
        'content-disposition': `inline; filename="${found.message.id}.eml"`,
      });
      response.end(found.raw);
    } else if (request.method === 'GET' && url.pathname === '/') {
      sendJson(response, 200, {
        service: 'Keenroute local mail catcher',
        endpoints: ['GET /messages', 'GET /messages/:id/raw', 'DELETE /messages'],
      });
    } else {
      sendJson(response, 404, { message: 'Try GET /messages, GET /messages/:id/raw or DELETE /messages.' });
    }
  });

  await new Promise<void>((resolve, reject) => {
    smtp.once('error', (error) => reject(listenError(error, 'SMTP side', options.smtpPort)));
    smtp.listen(options.smtpPort, host, () => resolve());
  });
  try {
    await new Promise<void>((resolve, reject) => {
      api.once('error', (error) => reject(listenError(error, 'HTTP API', options.httpPort)));
      api.listen(options.httpPort, host, () => resolve());
    });
  } catch (error) {
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
    throw error;
  }
  smtp.on('error', (error) => console.error(`[mail-catcher] SMTP error: ${error.message}`));

  const smtpPort = (smtp.server.address() as AddressInfo).port;
  const httpPort = (api.address() as AddressInfo).port;
  let stopping: Promise<void> | undefined;
  return {
    smtpPort,
    httpPort,
    url: `http://${host}:${httpPort}`,
    stop() {
      stopping ??= Promise.all([
        new Promise<void>((resolve) => smtp.close(() => resolve())),
        new Promise<void>((resolve) => {
          api.close(() => resolve());
          api.closeAllConnections();
        }),
      ]).then(() => undefined);
      return stopping;
    },
  };
}

async function runStandalone(): Promise<void> {
  const { values } = parseArgs({
    options: {
      'smtp-port': { type: 'string', default: process.env.MAIL_CATCHER_SMTP_PORT ?? '2525' },
      'http-port': { type: 'string', default: process.env.MAIL_CATCHER_HTTP_PORT ?? '1080' },
    },
  });
  const catcher = await startMailCatcher({
    smtpPort: Number(values['smtp-port']),
    httpPort: Number(values['http-port']),
  });
  console.log(
    `Mail catcher: SMTP on 127.0.0.1:${catcher.smtpPort}, messages at ${catcher.url}/messages (Ctrl-C stops it).`,
  );
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.once(signal, () => void catcher.stop().then(() => process.exit(0)));
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  runStandalone().catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
}
