import { createServer, type IncomingHttpHeaders, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';

export interface Received {
  rawBody: string;
  headers: IncomingHttpHeaders;
  signature: string;
  at: number;
  event: { id: string; type: string };
}

/**
 * A small local webhook endpoint for tests: records every request with its
 * raw body, answers 200 unless told to fail, can hold answers back, and counts
 * how many requests overlap.
 */
export class WebhookReceiver {
  readonly received: Received[] = [];
  private statuses: number[] = [];
  private always: number | null = null;
  responseDelayMs = 0;
  inFlight = 0;
  maxInFlight = 0;

  private constructor(
    private readonly server: Server,
    readonly url: string,
  ) {}

  static async start(path = '/webhooks/payments'): Promise<WebhookReceiver> {
    let receiver: WebhookReceiver | undefined;
    const server = createServer((req, res) => {
      receiver?.handle(req, res);
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const { port } = server.address() as AddressInfo;
    receiver = new WebhookReceiver(server, `http://127.0.0.1:${port}${path}`);
    return receiver;
  }

  /** Answer the next requests with these statuses, then 200 again. */
  failNext(...statuses: number[]): void {
    this.statuses.push(...statuses);
  }

  /** Answer every request with this status (null: back to 200). */
  alwaysAnswer(status: number | null): void {
    this.always = status;
  }

  private handle(req: IncomingMessage, res: ServerResponse): void {
    const chunks: Buffer[] = [];
    this.inFlight += 1;
    this.maxInFlight = Math.max(this.maxInFlight, this.inFlight);
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('end', () => {
      const rawBody = Buffer.concat(chunks).toString('utf8');
      const parsed = JSON.parse(rawBody) as { id: string; type: string };
      this.received.push({
        rawBody,
        headers: req.headers,
        signature: String(req.headers['stripe-signature']),
        at: Date.now(),
        event: { id: parsed.id, type: parsed.type },
      });
      const status = this.statuses.shift() ?? this.always ?? 200;
      setTimeout(() => {
        this.inFlight -= 1;
        res.writeHead(status, { 'Content-Type': 'application/json' }).end(JSON.stringify({ received: status < 300 }));
      }, this.responseDelayMs);
    });
  }

  /** Waits until at least `count` requests have arrived. */
  async waitFor(count: number, timeoutMs = 5000): Promise<Received[]> {
    const deadline = Date.now() + timeoutMs;
    while (this.received.length < count) {
      if (Date.now() > deadline) {
        throw new Error(`expected ${count} webhook requests, got ${this.received.length} in ${timeoutMs} ms`);
      }
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
    return this.received.slice(0, count);
  }

  types(): string[] {
    return this.received.map((r) => r.event.type);
  }

  close(): Promise<void> {
    return new Promise((resolve) => {
      this.server.close(() => resolve());
      this.server.closeAllConnections();
    });
  }
}
