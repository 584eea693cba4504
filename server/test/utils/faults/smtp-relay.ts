import type { AddressInfo } from 'node:net';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export interface RelayedMail {
  to: string[];
  subject: string;
  attachments: { filename: string | null; size: number }[];
}

export interface SmtpRelayOptions {
  /** How long the relay waits after a message's last byte before it answers (a slow relay). */
  answerAfterMs?: number;
}

/**
 * An SMTP relay the fault tests switch off and on, on a port that stays the same, and that counts what it accepted.
 * A message counts only once the relay has answered 250 for it: a sender that vanished before the answer (a killed
 * worker) did not deliver it, as with a real relay, and such a message is counted in `abandoned` instead.
 */
export class SmtpRelay {
  readonly accepted: RelayedMail[] = [];
  abandoned = 0;
  /** Messages whose last byte has arrived and that wait for the relay's answer. */
  waiting = 0;
  private server: SMTPServer | undefined;
  private readonly closed = new Set<string>();

  constructor(
    public port = 0,
    private readonly options: SmtpRelayOptions = {},
  ) {}

  get running(): boolean {
    return this.server !== undefined;
  }

  async start(): Promise<void> {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      closeTimeout: 100,
      onClose: (session) => this.closed.add(session.id),
      onData: (stream, session, callback) => {
        void this.receive(stream, session.id).then(
          () => callback(),
          (error: Error) => callback(error),
        );
      },
    });
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(this.port, '127.0.0.1', () => resolve());
    });
    this.port = (server.server.address() as AddressInfo).port;
    this.server = server;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  /** Resolves once `count` messages were accepted, or fails naming what arrived. */
  async waitForAccepted(count: number, timeoutMs: number): Promise<RelayedMail[]> {
    const deadline = Date.now() + timeoutMs;
    while (this.accepted.length < count) {
      if (Date.now() > deadline) {
        throw new Error(`The relay accepted ${this.accepted.length} of ${count} e-mails within ${timeoutMs} ms.`);
      }
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    return this.accepted;
  }

  private async receive(stream: NodeJS.ReadableStream, sessionId: string): Promise<void> {
    const chunks: Buffer[] = [];
    for await (const chunk of stream) chunks.push(Buffer.from(chunk as Buffer));
    this.waiting += 1;
    try {
      if (this.options.answerAfterMs) await new Promise((r) => setTimeout(r, this.options.answerAfterMs));
    } finally {
      this.waiting -= 1;
    }
    if (this.closed.has(sessionId)) {
      this.abandoned += 1;
      return;
    }
    const parsed = await simpleParser(Buffer.concat(chunks));
    const to = [parsed.to ?? []].flat().flatMap((group) => group.value.map((entry) => entry.address ?? ''));
    this.accepted.push({
      to,
      subject: parsed.subject ?? '',
      attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? null, size: a.size })),
    });
  }
}
