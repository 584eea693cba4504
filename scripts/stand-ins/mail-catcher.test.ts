import assert from 'node:assert/strict';
import { after, before, beforeEach, describe, it } from 'node:test';
import nodemailer, { type SendMailOptions } from 'nodemailer';
import { startMailCatcher, type CaughtMessage, type MailCatcher } from './mail-catcher.js';

interface Listing {
  items: CaughtMessage[];
  total: number;
}

void describe('mail catcher', () => {
  let catcher: MailCatcher;
  const send = (message: SendMailOptions) =>
    nodemailer
      .createTransport({ host: '127.0.0.1', port: catcher.smtpPort, secure: false, ignoreTLS: true })
      .sendMail({ from: 'Keenroute (demo) <no-reply@demo.keenroute.test>', ...message });
  const list = async (): Promise<Listing> => (await fetch(`${catcher.url}/messages`)).json() as Promise<Listing>;

  before(async () => {
    catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0, host: '127.0.0.1', limit: 3 });
  });
  after(() => catcher.stop());
  beforeEach(async () => {
    const cleared = await fetch(`${catcher.url}/messages`, { method: 'DELETE' });
    assert.equal(cleared.status, 204);
  });

  void it('reports the real ports it picked', () => {
    assert.ok(catcher.smtpPort > 0 && catcher.httpPort > 0);
    assert.notEqual(catcher.smtpPort, catcher.httpPort);
  });

  void it('reads back a message with its recipients, bodies and attachments', async () => {
    await send({
      to: ['owner@demo.keenroute.test', 'office@demo.keenroute.test'],
      subject: 'Your invitation to Keenroute',
      text: 'Set your password: http://127.0.0.1:3000/invitation/abc',
      html: '<p>Set your password</p>',
      attachments: [{ filename: 'route-day.txt', content: 'Stop 1: demo salon', contentType: 'text/plain' }],
    });
    const { items, total } = await list();
    assert.equal(total, 1);
    const [message] = items;
    assert.ok(message);
    assert.deepEqual(message.to, ['owner@demo.keenroute.test', 'office@demo.keenroute.test']);
    assert.match(message.from, /no-reply@demo\.keenroute\.test/);
    assert.equal(message.subject, 'Your invitation to Keenroute');
    assert.match(message.text, /invitation\/abc/);
    assert.equal(message.html, '<p>Set your password</p>');
    assert.deepEqual(message.attachments, [{ filename: 'route-day.txt', contentType: 'text/plain', size: 18 }]);
    assert.ok(!Number.isNaN(Date.parse(message.date)));

    const raw = await fetch(`${catcher.url}/messages/${message.id}/raw`);
    assert.equal(raw.status, 200);
    assert.match(await raw.text(), /^Subject: Your invitation to Keenroute$/m);
  });

  void it('lists newest first and keeps only the newest `limit` messages', async () => {
    for (const n of [1, 2, 3, 4]) await send({ to: 'client@demo.keenroute.test', subject: `Reset ${n}`, text: 'x' });
    const { items, total } = await list();
    assert.equal(total, 3);
    assert.deepEqual(
      items.map((item) => item.subject),
      ['Reset 4', 'Reset 3', 'Reset 2'],
    );
  });

  void it('answers 404 for an unknown message and clears on DELETE', async () => {
    await send({ to: 'sharpener@demo.keenroute.test', subject: 'Hello', text: 'x' });
    assert.equal((await fetch(`${catcher.url}/messages/nope/raw`)).status, 404);
    await fetch(`${catcher.url}/messages`, { method: 'DELETE' });
    assert.equal((await list()).total, 0);
  });

  void it('refuses a port already taken with a message that says what to do', async () => {
    await assert.rejects(
      startMailCatcher({ smtpPort: catcher.smtpPort, httpPort: 0 }),
      /Port \d+ on 127\.0\.0\.1 is already taken[\s\S]*choose another port/,
    );
  });
});
