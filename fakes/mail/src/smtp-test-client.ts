import { connect, type Socket } from 'node:net';

export interface SmtpReply {
  code: number;
  lines: string[];
}

/** A bare SMTP client over a socket, for tests: one command, one reply. */
export class SmtpTestClient {
  private buffer = '';
  private lines: string[] = [];
  private pending: ((reply: SmtpReply) => void)[] = [];
  private replies: SmtpReply[] = [];

  private constructor(private readonly socket: Socket) {
    socket.setEncoding('utf8');
    socket.on('data', (chunk: string) => this.onData(chunk));
  }

  static connect(port: number, host = '127.0.0.1'): Promise<{ client: SmtpTestClient; greeting: SmtpReply }> {
    return new Promise((resolve, reject) => {
      const socket = connect(port, host);
      socket.once('error', reject);
      const client = new SmtpTestClient(socket);
      client.nextReply().then((greeting) => {
        socket.off('error', reject);
        socket.on('error', () => {});
        resolve({ client, greeting });
      }, reject);
    });
  }

  private onData(chunk: string) {
    this.buffer += chunk;
    let eol: number;
    while ((eol = this.buffer.indexOf('\r\n')) >= 0) {
      const line = this.buffer.slice(0, eol);
      this.buffer = this.buffer.slice(eol + 2);
      this.lines.push(line.slice(4));
      // The last line of a reply has a space (or nothing) after the code, RFC 5321 §4.2.1.
      if (/^\d{3}(?: |$)/.test(line)) {
        const reply = { code: Number(line.slice(0, 3)), lines: this.lines };
        this.lines = [];
        const waiter = this.pending.shift();
        if (waiter) waiter(reply);
        else this.replies.push(reply);
      }
    }
  }

  nextReply(): Promise<SmtpReply> {
    const ready = this.replies.shift();
    if (ready) return Promise.resolve(ready);
    return new Promise((resolve) => this.pending.push(resolve));
  }

  command(line: string): Promise<SmtpReply> {
    this.socket.write(`${line}\r\n`);
    return this.nextReply();
  }

  /** Sends the message text after DATA, dot-stuffed (RFC 5321 §4.5.2), and returns the final reply. */
  async data(message: string | Buffer): Promise<SmtpReply> {
    const start = await this.command('DATA');
    if (start.code !== 354) return start;
    // latin1 maps bytes one to one, so the message's bytes go out unchanged.
    let text = (Buffer.isBuffer(message) ? message : Buffer.from(message, 'utf8')).toString('latin1');
    if (!text.endsWith('\r\n')) text += '\r\n';
    const stuffed = text.replace(/(^|\r\n)\./g, '$1..');
    this.socket.write(Buffer.from(`${stuffed}.\r\n`, 'latin1'));
    return this.nextReply();
  }

  async quit(): Promise<void> {
    await this.command('QUIT').catch(() => undefined);
    this.socket.end();
  }
}

/** One whole SMTP session: EHLO, MAIL, RCPT per recipient, DATA, QUIT. Returns the DATA reply. */
export async function sendRaw(port: number, envelope: { from: string; to: string[] }, message: string | Buffer): Promise<SmtpReply> {
  const { client } = await SmtpTestClient.connect(port);
  try {
    const steps = [`EHLO tests.fryline.test`, `MAIL FROM:<${envelope.from}>`, ...envelope.to.map((t) => `RCPT TO:<${t}>`)];
    for (const step of steps) {
      const reply = await client.command(step);
      if (reply.code >= 400) return reply;
    }
    return await client.data(message);
  } finally {
    await client.quit();
  }
}

export interface MimePart {
  filename: string;
  contentType: string;
  content: Buffer;
}

/** A multipart/mixed message with text, HTML and base64 attachments (RFC 2045, RFC 2046). */
export function buildMime(m: { from: string; to: string[]; subject: string; messageId: string; text: string; html?: string; files?: MimePart[] }): string {
  const boundary = 'b1-fryline-test-boundary';
  const alt = 'b2-fryline-test-alternative';
  const base64Lines = (b: Buffer) => (b.toString('base64').match(/.{1,76}/g) ?? []).join('\r\n');
  const body = [
    `--${alt}`,
    'Content-Type: text/plain; charset=utf-8',
    'Content-Transfer-Encoding: base64',
    '',
    base64Lines(Buffer.from(m.text, 'utf8')),
    ...(m.html
      ? [`--${alt}`, 'Content-Type: text/html; charset=utf-8', 'Content-Transfer-Encoding: base64', '', base64Lines(Buffer.from(m.html, 'utf8'))]
      : []),
    `--${alt}--`,
  ];
  const files = (m.files ?? []).flatMap((f) => [
    `--${boundary}`,
    `Content-Type: ${f.contentType}; name="${f.filename}"`,
    `Content-Disposition: attachment; filename="${f.filename}"`,
    'Content-Transfer-Encoding: base64',
    '',
    base64Lines(f.content),
  ]);
  return [
    `From: ${m.from}`,
    `To: ${m.to.join(', ')}`,
    `Subject: ${m.subject}`,
    `Message-ID: ${m.messageId}`,
    'Date: Sat, 07 Mar 2026 05:30:00 +0000',
    'MIME-Version: 1.0',
    `Content-Type: multipart/mixed; boundary="${boundary}"`,
    '',
    `--${boundary}`,
    `Content-Type: multipart/alternative; boundary="${alt}"`,
    '',
    ...body,
    ...files,
    `--${boundary}--`,
    '',
  ].join('\r\n');
}
