import type { Request, RequestHandler, Response } from 'express';
import type { FakeClock } from './clock.js';
import { ApiError } from './errors.js';

const LIFETIME_SECONDS = 24 * 60 * 60;
const MAX_KEY_LENGTH = 255;

interface InFlight {
  state: 'in_flight';
  fingerprint: string;
  createdAt: number;
}

export interface Completed {
  state: 'completed';
  fingerprint: string;
  createdAt: number;
  status: number;
  body: unknown;
}

type Entry = InFlight | Completed;

/** Key order does not change what a request means. */
function canonical(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(canonical);
  if (typeof value === 'object' && value !== null) {
    return Object.fromEntries(
      Object.keys(value)
        .sort()
        .map((key) => [key, canonical((value as Record<string, unknown>)[key])]),
    );
  }
  return value;
}

function fingerprintOf(req: Request): string {
  return JSON.stringify([req.method, req.path, canonical(req.body ?? {})]);
}

/**
 * Remembers the first answer to each `Idempotency-Key` (per API key) for 24
 * hours on the fake's clock and replays it. The same key with other
 * parameters is refused (400 `idempotency_error`); a duplicate that arrives
 * while the first is still being handled gets 409, which the SDK retries.
 * Requests that fail parameter validation are not remembered.
 */
export class IdempotencyStore {
  private readonly entries = new Map<string, Entry>();

  constructor(private readonly clock: FakeClock) {}

  get size(): number {
    return this.entries.size;
  }

  clear(): void {
    this.entries.clear();
  }

  /** Answered keys (in-flight ones are not worth keeping across a restart: their request died with it). */
  snapshot(): Array<[string, Completed]> {
    return [...this.entries].filter((pair): pair is [string, Completed] => pair[1].state === 'completed');
  }

  restore(entries: ReadonlyArray<[string, Completed]>): void {
    this.entries.clear();
    for (const [scope, entry] of entries) this.entries.set(scope, entry);
  }

  private purge(): void {
    const oldest = this.clock.now() - LIFETIME_SECONDS;
    for (const [scope, entry] of this.entries) {
      if (entry.createdAt <= oldest) this.entries.delete(scope);
    }
  }

  middleware(apiKeyOf: (res: Response) => string): RequestHandler {
    return (req, res, next) => {
      const key = req.get('Idempotency-Key');
      if (req.method !== 'POST' || key === undefined) {
        next();
        return;
      }
      if (key.length > MAX_KEY_LENGTH) {
        throw new ApiError(400, {
          type: 'invalid_request_error',
          message: `Idempotency keys can be at most ${MAX_KEY_LENGTH} characters long.`,
        }, true);
      }
      this.purge();
      const scope = `${apiKeyOf(res)} ${key}`;
      const fingerprint = fingerprintOf(req);
      const entry = this.entries.get(scope);
      res.set('Idempotency-Key', key);
      if (entry) {
        if (entry.fingerprint !== fingerprint) {
          throw new ApiError(400, {
            type: 'idempotency_error',
            message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try a key other than '${key}' if you meant to make a different request.`,
          });
        }
        if (entry.state === 'in_flight') {
          throw new ApiError(409, {
            type: 'idempotency_error',
            code: 'idempotency_key_in_use',
            message: `Another request with the idempotency key '${key}' is still being handled. Retry after it has finished.`,
          });
        }
        res.set('Idempotent-Replayed', 'true');
        res.status(entry.status).json(entry.body);
        return;
      }

      const createdAt = this.clock.now();
      this.entries.set(scope, { state: 'in_flight', fingerprint, createdAt });
      const send = res.json.bind(res);
      let answered = false;
      res.json = (body: unknown) => {
        answered = true;
        const error = res.locals.apiError;
        if (error instanceof ApiError && error.beforeExecution) this.entries.delete(scope);
        else this.entries.set(scope, { state: 'completed', fingerprint, createdAt, status: res.statusCode, body: structuredClone(body) });
        return send(body);
      };
      res.on('close', () => {
        if (!answered) this.entries.delete(scope);
      });
      next();
    };
  }
}
