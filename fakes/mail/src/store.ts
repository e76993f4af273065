export interface CapturedAttachment {
  /** The part's file name, or attachment-<n> when it named none. */
  filename: string;
  contentType: string;
  /** Decoded size in bytes. */
  size: number;
  content: Buffer;
  /** Content-ID without angle brackets, for parts embedded in the HTML. */
  contentId: string | null;
  inline: boolean;
}

export interface CapturedMessage {
  id: string;
  /** When the stand-in accepted the message (ISO 8601). */
  receivedAt: string;
  /** SMTP envelope: MAIL FROM and every RCPT TO (Bcc recipients show up only here). */
  envelope: { from: string; to: string[] };
  /** Address of the From header ('' when missing). */
  from: string;
  /** Display name of the From header ('' when none). */
  fromName: string;
  /** Addresses of the To header. */
  to: string[];
  cc: string[];
  subject: string;
  /** Date header as ISO 8601, or receivedAt when the message had none. */
  date: string;
  /** Message-ID header with its angle brackets, or null. */
  messageId: string | null;
  text: string | null;
  html: string | null;
  attachments: CapturedAttachment[];
  /** Header lines by lower-case name; repeated headers are joined with "\n". */
  headers: Record<string, string>;
  /** The message exactly as received over SMTP (after dot-unstuffing). */
  raw: Buffer;
}

type Waiter = { pred: (m: CapturedMessage) => boolean; resolve: (m: CapturedMessage) => void };

/** Captured messages in memory, oldest first internally. */
export class MessageStore {
  private items: CapturedMessage[] = [];
  private waiters = new Set<Waiter>();

  add(message: CapturedMessage): void {
    this.items.push(message);
    for (const w of [...this.waiters]) {
      if (w.pred(message)) {
        this.waiters.delete(w);
        w.resolve(message);
      }
    }
  }

  /** Newest first. */
  list(): CapturedMessage[] {
    return [...this.items].reverse();
  }

  get(id: string): CapturedMessage | undefined {
    return this.items.find((m) => m.id === id);
  }

  clear(): void {
    this.items = [];
  }

  remove(id: string): boolean {
    const before = this.items.length;
    this.items = this.items.filter((m) => m.id !== id);
    return this.items.length < before;
  }

  /** The newest message already captured that matches, or the next one to arrive. */
  waitFor(pred: (m: CapturedMessage) => boolean, timeoutMs: number): Promise<CapturedMessage> {
    const found = this.list().find(pred);
    if (found) return Promise.resolve(found);
    return new Promise((resolve, reject) => {
      const waiter: Waiter = {
        pred,
        resolve: (m) => {
          clearTimeout(timer);
          resolve(m);
        },
      };
      const timer = setTimeout(() => {
        this.waiters.delete(waiter);
        reject(new Error(`no captured message matched within ${timeoutMs} ms (${this.items.length} captured so far)`));
      }, timeoutMs);
      this.waiters.add(waiter);
    });
  }
}

/** Does the message go to this address (To, Cc or any envelope recipient)? */
export function isAddressedTo(message: CapturedMessage, address: string): boolean {
  const wanted = address.trim().toLowerCase();
  return [...message.to, ...message.cc, ...message.envelope.to].some((a) => a.toLowerCase() === wanted);
}
