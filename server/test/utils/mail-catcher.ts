export interface CaughtMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
}

/**
 * Waits until the local mail catcher holds a message to `to` whose subject matches, and returns it. E-mail goes out
 * through the job queue (src/mail), so the wait covers a worker's polling interval and a PDF drawn on a busy machine.
 */
export async function waitForMail(to: string, subject: RegExp, timeoutMs = 20_000): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await mailTo(to)).find((mail) => subject.test(mail.subject));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`No e-mail to ${to} matching ${subject} arrived.`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

export async function mailTo(to: string): Promise<CaughtMail[]> {
  const response = await fetch(`${process.env.MAIL_CATCHER_URL}/messages`);
  const body = (await response.json()) as { items: CaughtMail[] };
  return body.items.filter((mail) => mail.to.some((address) => address.toLowerCase().includes(to.toLowerCase())));
}

/** The secret from the set-password link in an invitation or reset e-mail. */
export function linkToken(mail: CaughtMail): string {
  const match = /\/set-password\?token=([A-Za-z0-9_-]+)/.exec(mail.text);
  if (!match) throw new Error(`No set-password link in "${mail.subject}".`);
  return match[1]!;
}
