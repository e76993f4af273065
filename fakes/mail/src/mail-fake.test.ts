import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { connect } from 'node:net';
import { startMailFake, PortInUseError, type MailFake } from './index.js';
import { SmtpTestClient, buildMime, sendRaw } from './smtp-test-client.js';

let fake: MailFake;

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0 });
});
afterAll(() => fake.close());
beforeEach(() => fake.clear());

// PNG file signature, PNG specification (ISO/IEC 15948) §5.2, followed by our own bytes.
const PNG_BYTES = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(1000, 0xa7)]);
const CSV = Buffer.from('item,dozens\nhoney glaze,6\ncinnamon sugar,4\n', 'utf8');

function pickupMail(to: string, subject: string, messageId = `<${subject.replace(/\W+/g, '-')}@fryline.test>`) {
  return buildMime({
    from: 'Fryline Orders <orders@fryline.test>',
    to: [to],
    subject,
    messageId,
    text: 'Your pre-order is ready for pickup on Saturday.\nPickup code: QX7-42\n',
    html: '<p>Your pre-order is ready.</p><script>alert(1)</script><p>Code: <b>QX7-42</b></p>',
    files: [
      { filename: 'pickup-code.png', contentType: 'image/png', content: PNG_BYTES },
      { filename: 'order.csv', contentType: 'text/csv', content: CSV },
    ],
  });
}

async function getJson(path: string) {
  const res = await fetch(`${fake.url}${path}`);
  return { status: res.status, body: (await res.json()) as any };
}

describe('SMTP side', () => {
  it('advertises SIZE and neither AUTH nor STARTTLS in the EHLO reply (RFC 1870 §4, RFC 3207 §4)', async () => {
    const { client, greeting } = await SmtpTestClient.connect(fake.smtpPort);
    expect(greeting.code).toBe(220);
    const ehlo = await client.command('EHLO tests.fryline.test');
    expect(ehlo.code).toBe(250);
    expect(ehlo.lines).toContain('SIZE 10485760');
    expect(ehlo.lines.some((l) => /^(AUTH|STARTTLS)\b/.test(l))).toBe(false);
    const auth = await client.command('AUTH PLAIN AGZyeWxpbmUAc2VjcmV0');
    expect(auth.code).toBeGreaterThanOrEqual(500);
    await client.quit();
  });

  it('accepts a message and answers 250 (RFC 5321 §4.3.2)', async () => {
    const reply = await sendRaw(fake.smtpPort, { from: 'orders@fryline.test', to: ['ada@example.test'] }, pickupMail('ada@example.test', 'Pickup ready'));
    expect(reply.code).toBe(250);
    expect(fake.messages()).toHaveLength(1);
  });

  it('refuses a declared SIZE over the limit with 552 at MAIL FROM (RFC 1870 §6.1)', async () => {
    const { client } = await SmtpTestClient.connect(fake.smtpPort);
    await client.command('EHLO tests.fryline.test');
    const reply = await client.command(`MAIL FROM:<orders@fryline.test> SIZE=${10 * 1024 * 1024 + 1}`);
    expect(reply.code).toBe(552);
    await client.quit();
  });

  it('refuses an undeclared message over 10 MiB with 552 after DATA and keeps nothing (RFC 1870 §6.3)', async () => {
    // lines of 998 characters plus CRLF, the longest RFC 5321 §4.5.3.1.6 allows
    const filler = `${'y'.repeat(998)}\r\n`.repeat(Math.ceil((10 * 1024 * 1024) / 1000) + 10);
    const raw = `Subject: too big\r\n\r\n${filler}`;
    const reply = await sendRaw(fake.smtpPort, { from: 'orders@fryline.test', to: ['ada@example.test'] }, raw);
    expect(reply.code).toBe(552);
    expect(reply.lines.join(' ')).toMatch(/maximum message size/i);
    expect(fake.messages()).toHaveLength(0);
  });

  it('undoes dot-stuffing so lines starting with "." arrive intact (RFC 5321 §4.5.2)', async () => {
    const raw = 'From: orders@fryline.test\r\nTo: ada@example.test\r\nSubject: dots\r\n\r\n.first line\r\n..second\r\nthird\r\n';
    expect((await sendRaw(fake.smtpPort, { from: 'orders@fryline.test', to: ['ada@example.test'] }, raw)).code).toBe(250);
    const [m] = fake.messages();
    expect(m!.raw.toString('utf8')).toBe(raw);
    expect(m!.text).toContain('.first line\n..second\nthird');
  });

  it('tells an open session 421 when the SMTP side is taken down (RFC 5321 §3.8)', async () => {
    const { client } = await SmtpTestClient.connect(fake.smtpPort);
    await client.command('EHLO tests.fryline.test');
    await fake.stopSmtp();
    expect((await client.nextReply()).code).toBe(421);
    await fake.startSmtp();
  });

  it('can be stopped and started again on the same port while the inbox stays up', async () => {
    const port = fake.smtpPort;
    await fake.stopSmtp();
    const refused = await new Promise<string>((resolve) => {
      const s = connect(port, '127.0.0.1');
      s.once('connect', () => {
        s.destroy();
        resolve('connected');
      });
      s.once('error', (err: NodeJS.ErrnoException) => resolve(err.code ?? 'error'));
    });
    expect(refused).toBe('ECONNREFUSED');
    expect((await getJson('/api/messages')).status).toBe(200);
    await fake.startSmtp();
    expect(fake.smtpPort).toBe(port);
    const reply = await sendRaw(port, { from: 'orders@fryline.test', to: ['ada@example.test'] }, pickupMail('ada@example.test', 'Back again'));
    expect(reply.code).toBe(250);
  });
});

describe('JSON API', () => {
  it('reads a message back with text, HTML and attachments', async () => {
    await sendRaw(fake.smtpPort, { from: 'orders@fryline.test', to: ['ada@example.test'] }, pickupMail('ada@example.test', 'Pickup ready'));
    const list = await getJson('/api/messages');
    expect(list.body).toHaveLength(1);
    const row = list.body[0];
    expect(row).toMatchObject({
      to: ['ada@example.test'],
      from: 'orders@fryline.test',
      subject: 'Pickup ready',
      // RFC 5322 §3.3 date-time "Sat, 07 Mar 2026 05:30:00 +0000"
      date: '2026-03-07T05:30:00.000Z',
    });
    const { status, body } = await getJson(`/api/messages/${row.id}`);
    expect(status).toBe(200);
    expect(body).toMatchObject({ id: row.id, messageId: '<Pickup-ready@fryline.test>', fromName: 'Fryline Orders' });
    expect(body.text).toContain('Pickup code: QX7-42');
    expect(body.html).toContain('<b>QX7-42</b>');
    expect(body.envelope).toEqual({ from: 'orders@fryline.test', to: ['ada@example.test'] });
    expect(body.headers['message-id']).toBe('<Pickup-ready@fryline.test>');
    expect(body.attachments).toEqual([
      expect.objectContaining({ filename: 'pickup-code.png', contentType: 'image/png', size: PNG_BYTES.length }),
      expect.objectContaining({ filename: 'order.csv', contentType: 'text/csv', size: CSV.length }),
    ]);
  });

  it('serves attachment bytes with their content type', async () => {
    await sendRaw(fake.smtpPort, { from: 'orders@fryline.test', to: ['ada@example.test'] }, pickupMail('ada@example.test', 'Files'));
    const [m] = fake.messages();
    const png = await fetch(`${fake.url}/api/messages/${m!.id}/attachments/0`);
    expect(png.status).toBe(200);
    expect(png.headers.get('content-type')).toBe('image/png');
    expect(png.headers.get('content-disposition')).toContain('pickup-code.png');
    expect(Buffer.from(await png.arrayBuffer()).equals(PNG_BYTES)).toBe(true);
    const csv = await fetch(`${fake.url}/api/messages/${m!.id}/attachments/1`);
    expect(csv.headers.get('content-type')).toMatch(/^text\/csv/);
    expect(Buffer.from(await csv.arrayBuffer()).equals(CSV)).toBe(true);
    expect((await fetch(`${fake.url}/api/messages/${m!.id}/attachments/2`)).status).toBe(404);
    expect((await fetch(`${fake.url}/api/messages/${m!.id}/attachments/x`)).status).toBe(404);
  });

  it('lists newest first, filters by recipient (To, Cc or envelope-only Bcc) and clears', async () => {
    const send = (to: string, subject: string, rcpt = [to]) =>
      sendRaw(fake.smtpPort, { from: 'orders@fryline.test', to: rcpt }, pickupMail(to, subject));
    await send('ada@example.test', 'first');
    await send('bo@example.test', 'second');
    await send('ada@example.test', 'third', ['ada@example.test', 'counter@fryline.test']);
    expect((await getJson('/api/messages')).body.map((m: any) => m.subject)).toEqual(['third', 'second', 'first']);
    expect((await getJson('/api/messages?to=ADA@example.test')).body.map((m: any) => m.subject)).toEqual(['third', 'first']);
    expect((await getJson('/api/messages?to=counter@fryline.test')).body.map((m: any) => m.subject)).toEqual(['third']);
    expect((await getJson('/api/messages?to=nobody@example.test')).body).toEqual([]);
    expect((await fetch(`${fake.url}/api/messages`, { method: 'DELETE' })).status).toBe(204);
    expect((await getJson('/api/messages')).body).toEqual([]);
  });

  it('answers 404 for an unknown message', async () => {
    expect((await getJson('/api/messages/no-such-id')).status).toBe(404);
  });
});

describe('waitFor', () => {
  it('resolves with a message that arrives later and rejects after the timeout', async () => {
    const waiting = fake.waitFor((m) => m.subject === 'late one', 3000);
    setTimeout(() => {
      void sendRaw(fake.smtpPort, { from: 'orders@fryline.test', to: ['ada@example.test'] }, pickupMail('ada@example.test', 'late one'));
    }, 50);
    expect((await waiting).to).toEqual(['ada@example.test']);
    await expect(fake.waitFor((m) => m.subject === 'never sent', 100)).rejects.toThrow(/within 100 ms/);
  });
});

describe('web inbox', () => {
  it('lists messages and shows one with its HTML in a sandboxed frame and attachment links', async () => {
    await sendRaw(fake.smtpPort, { from: 'orders@fryline.test', to: ['ada@example.test'] }, pickupMail('ada@example.test', 'Pickup ready'));
    const [m] = fake.messages();
    const list = await (await fetch(`${fake.url}/`)).text();
    expect(list).toContain(`href="/messages/${m!.id}"`);
    expect(list).toContain('Pickup ready');
    const res = await fetch(`${fake.url}/messages/${m!.id}`);
    expect(res.headers.get('content-security-policy')).toContain("script-src 'none'");
    const html = await res.text();
    expect(html).toMatch(/<iframe sandbox="" [^>]*srcdoc="[^"]*&#60;script&#62;alert\(1\)&#60;\/script&#62;/);
    expect(html).not.toContain('<script>');
    expect(html).toContain(`href="/api/messages/${m!.id}/attachments/0"`);
    expect(html).toContain(`href="/api/messages/${m!.id}/attachments/1"`);
    expect(html + list).not.toMatch(/(src|href)="(https?:)?\/\//);
  });
});

describe('startMailFake', () => {
  it('names the taken port when SMTP cannot listen', async () => {
    const err = await startMailFake({ smtpPort: fake.smtpPort }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(PortInUseError);
    expect((err as PortInUseError).message).toContain(String(fake.smtpPort));
    expect((err as PortInUseError).service).toBe('smtp');
  });

  it('names the taken port when the inbox cannot listen, and frees its SMTP port', async () => {
    const err = await startMailFake({ httpPort: fake.httpPort }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(PortInUseError);
    expect((err as PortInUseError).service).toBe('http');
    expect((err as PortInUseError).port).toBe(fake.httpPort);
  });
});
