import type { AddressInfo } from 'node:net';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import { parseCaptured } from './capture.js';
import { listenOn } from './listen.js';
import type { CapturedMessage } from './store.js';

export const DEFAULT_MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

function smtpError(code: number, message: string): Error {
  return Object.assign(new Error(message), { responseCode: code });
}

/** The SMTP side: can be taken down and brought back on the same port. */
export class SmtpCapture {
  private server: SMTPServer | null = null;
  private boundPort: number;

  constructor(
    private readonly opts: { port: number; host: string; maxBytes: number; onMessage: (m: CapturedMessage) => void },
  ) {
    this.boundPort = opts.port;
  }

  get port(): number {
    return this.boundPort;
  }

  get running(): boolean {
    return this.server !== null;
  }

  async start(): Promise<void> {
    if (this.server) return;
    const server = new SMTPServer({
      name: 'mail-stand-in.fryline.test',
      banner: 'Fryline mail stand-in: messages are captured, never delivered',
      secure: false,
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      size: this.opts.maxBytes,
      rejectOversized: true,
      logger: false,
      // no reverse DNS for each client: nothing here resolves names on the network
      disableReverseLookup: true,
      closeTimeout: 250,
      onData: (stream, session, callback) => this.receive(stream, session, callback),
    });
    // Errors are re-emitted on the SMTPServer (a client dropping mid-session, a failed
    // bind); unhandled they would crash the process. Binding errors are read below.
    server.on('error', () => {});
    // SMTPServer has no 'listening' event of its own: wait on its net.Server.
    await listenOn(server.server, 'smtp', this.boundPort, this.opts.host);
    this.boundPort = (server.server.address() as AddressInfo).port;
    this.server = server;
  }

  stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    if (!server) return Promise.resolve();
    return new Promise((resolve) => server.close(() => resolve()));
  }

  private receive(stream: SMTPServerDataStream, session: SMTPServerSession, callback: (err?: Error | null, message?: string) => void) {
    const chunks: Buffer[] = [];
    stream.on('data', (chunk: Buffer) => {
      if (!stream.sizeExceeded) chunks.push(chunk);
    });
    stream.on('end', () => {
      if (stream.sizeExceeded) {
        callback(smtpError(552, `Message exceeds the fixed maximum message size of ${this.opts.maxBytes} bytes`));
        return;
      }
      const mailFrom = session.envelope.mailFrom;
      const envelope = {
        from: mailFrom ? mailFrom.address : '',
        to: session.envelope.rcptTo.map((r) => r.address),
      };
      parseCaptured(Buffer.concat(chunks), envelope, new Date()).then(
        (message) => {
          this.opts.onMessage(message);
          callback(null, `OK: captured as ${message.id}`);
        },
        (err: unknown) => callback(smtpError(554, `Message could not be parsed: ${err instanceof Error ? err.message : String(err)}`)),
      );
    });
  }
}
