import { describe, expect, it } from 'vitest';
import { database } from '../src/db/sequelize.js';
import { OutboxMessage } from '../src/db/models/index.js';
import { enqueueMail } from '../src/services/mail/outbox.js';
import { relayOutbox, backoffSeconds } from '../src/jobs/outbox-relay.js';
import { createMailTransport } from '../src/integrations/mailer.js';
import { useStack } from './support.js';

const stack = useStack({ demo: false });

async function queue(to: string, subject: string) {
  await database().transaction((transaction) =>
    enqueueMail(
      {
        kind: 'test',
        to,
        subject,
        text: 'Plain text body',
        html: '<p>HTML body</p>',
        attachments: [{ filename: 'note.txt', contentType: 'text/plain', content: Buffer.from('hello attachment').toString('base64') }],
      },
      transaction,
    ),
  );
}

describe('e-mail outbox and relay (SMTP, RFC 5321)', () => {
  it('delivers an outbox row to the SMTP server; the mail fake’s JSON route reads it back', async () => {
    await queue('reader@example.test', 'Outbox check');
    const transport = createMailTransport({ SMTP_HOST: '127.0.0.1', SMTP_PORT: stack.mail.smtpPort });
    expect(await relayOutbox(database(), transport, 'Fryline <orders@fryline.test>')).toEqual({ sent: 1, failed: 0 });
    const list = (await (await fetch(`${stack.mail.url}/api/messages`)).json()) as any;
    expect(list[0]).toMatchObject({ to: ['reader@example.test'], subject: 'Outbox check' });
    const detail = (await (await fetch(`${stack.mail.url}/api/messages/${list[0].id}`)).json()) as any;
    expect(detail.text.trim()).toBe('Plain text body');
    expect(detail.attachments[0]).toMatchObject({ filename: 'note.txt', size: 16 });
    const row = await OutboxMessage.findOne();
    expect(row?.status).toBe('sent');
    // the Message-ID fixed at queue time is the one the server received
    expect(detail.messageId).toBe(row?.messageId);
    transport.close();
  });

  it('keeps the row while the SMTP server is down and delivers it once it is back', async () => {
    await queue('patient@example.test', 'Survives an outage');
    await stack.mail.stopSmtp();
    const transport = createMailTransport({ SMTP_HOST: '127.0.0.1', SMTP_PORT: stack.mail.smtpPort });
    expect(await relayOutbox(database(), transport, 'orders@fryline.test')).toEqual({ sent: 0, failed: 1 });
    let row = await OutboxMessage.findOne();
    expect(row).toMatchObject({ status: 'pending', attempts: 1 });
    expect(row!.lastError).toBeTruthy();
    // not due yet: backoff holds it back
    expect(await relayOutbox(database(), transport, 'orders@fryline.test')).toEqual({ sent: 0, failed: 0 });
    await stack.mail.startSmtp();
    await database().query(`UPDATE outbox SET next_attempt_at = now()`);
    expect(await relayOutbox(database(), transport, 'orders@fryline.test')).toEqual({ sent: 1, failed: 0 });
    row = await OutboxMessage.findOne();
    expect(row).toMatchObject({ status: 'sent', attempts: 2 });
    expect(stack.mail.messages().filter((m) => m.subject === 'Survives an outage')).toHaveLength(1);
    transport.close();
  });

  it('two relays running at once send each message once (FOR UPDATE SKIP LOCKED)', async () => {
    for (let i = 0; i < 12; i += 1) await queue(`many${i}@example.test`, `Message ${i}`);
    const a = createMailTransport({ SMTP_HOST: '127.0.0.1', SMTP_PORT: stack.mail.smtpPort });
    const b = createMailTransport({ SMTP_HOST: '127.0.0.1', SMTP_PORT: stack.mail.smtpPort });
    const results = await Promise.all([relayOutbox(database(), a, 'x@fryline.test', 6), relayOutbox(database(), b, 'x@fryline.test', 6)]);
    expect(results[0]!.sent + results[1]!.sent).toBe(12);
    expect(stack.mail.messages()).toHaveLength(12);
    a.close();
    b.close();
  });

  it('backs off exponentially, capped at five minutes', () => {
    expect([1, 2, 3, 8, 9, 20].map(backoffSeconds)).toEqual([2, 4, 8, 256, 300, 300]);
  });
});
