import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createInboxApp } from './inbox.js';
import { listenOn } from './listen.js';
import { DEFAULT_MAX_MESSAGE_BYTES, SmtpCapture } from './smtp.js';
import { MessageStore, type CapturedMessage } from './store.js';

export interface MailFakeOptions {
  /** 0 or absent → a free port. */
  smtpPort?: number;
  /** 0 or absent → a free port. */
  httpPort?: number;
  /** Default 127.0.0.1. */
  host?: string;
  /** Largest message accepted, in bytes (default 10 MiB); larger ones get SMTP 552. */
  maxMessageBytes?: number;
}

export interface MailFake {
  smtpPort: number;
  httpPort: number;
  /** Base URL of the web inbox and JSON API, e.g. http://127.0.0.1:3103 */
  url: string;
  /** Newest first. */
  messages(): CapturedMessage[];
  /** Resolves with the newest captured message matching pred, or the next to arrive; rejects after timeoutMs. */
  waitFor(pred: (m: CapturedMessage) => boolean, timeoutMs?: number): Promise<CapturedMessage>;
  clear(): void;
  /** Takes the SMTP side down (open sessions get 421); the inbox stays up. */
  stopSmtp(): Promise<void>;
  /** Brings the SMTP side back on the same port. */
  startSmtp(): Promise<void>;
  close(): Promise<void>;
}

function hostForUrl(host: string): string {
  const shown = host === '0.0.0.0' ? '127.0.0.1' : host === '::' ? '::1' : host;
  return shown.includes(':') ? `[${shown}]` : shown;
}

export async function startMailFake(opts: MailFakeOptions = {}): Promise<MailFake> {
  const host = opts.host ?? '127.0.0.1';
  const store = new MessageStore();
  const smtp = new SmtpCapture({
    port: opts.smtpPort ?? 0,
    host,
    maxBytes: opts.maxMessageBytes ?? DEFAULT_MAX_MESSAGE_BYTES,
    onMessage: (m) => store.add(m),
  });
  await smtp.start();
  const http = createServer(createInboxApp(store));
  try {
    await listenOn(http, 'http', opts.httpPort ?? 0, host);
  } catch (err) {
    await smtp.stop();
    throw err;
  }
  const httpPort = (http.address() as AddressInfo).port;
  return {
    smtpPort: smtp.port,
    httpPort,
    url: `http://${hostForUrl(host)}:${httpPort}`,
    messages: () => store.list(),
    waitFor: (pred, timeoutMs = 5000) => store.waitFor(pred, timeoutMs),
    clear: () => store.clear(),
    stopSmtp: () => smtp.stop(),
    startSmtp: () => smtp.start(),
    close: async () => {
      await smtp.stop();
      await new Promise<void>((resolve, reject) => {
        http.close((err) => (err ? reject(err) : resolve()));
        http.closeAllConnections();
      });
    },
  };
}
