import { pino, type Logger, type LevelWithSilent } from 'pino';

/**
 * The API's one logger: JSON lines (pino). Requests log through pino-http
 * with their request id; the jobs and the error handler log through children
 * of the same logger. Secrets never reach a line: the request and response
 * serializers keep only what is safe (no headers, no query string, no claim
 * token in a path) and `redact` removes any secret-shaped field that a log
 * call might still pass.
 */

/** Field paths removed from every line, whatever logs them. */
export const REDACT_PATHS = [
  'req.headers.cookie',
  'req.headers.authorization',
  'req.headers["x-csrf-token"]',
  'req.headers["stripe-signature"]',
  'res.headers["set-cookie"]',
  'headers.cookie',
  'headers.authorization',
  'cookie',
  'authorization',
  'password',
  'secret',
  'token',
  'sessionId',
  'sessionID',
  'cardNumber',
  'card',
  'cvc',
  'apiKey',
  '*.cookie',
  '*.authorization',
  '*.password',
  '*.secret',
  '*.token',
  '*.sessionId',
  '*.sessionID',
  '*.cardNumber',
  '*.card',
  '*.cvc',
  '*.apiKey',
  'err.raw',
  'err.headers',
  'err.requestHeaders',
];

type Sink = (line: string) => void;
const sinks = new Set<Sink>();

// Lines go to stdout (errors and worse to stderr), or only to the capturing
// sinks while a test listens. Every line starts with {"level":N.
const destination = {
  write(line: string) {
    if (sinks.size) for (const sink of sinks) sink(line);
    else if (/^\{"level":[56]0/.test(line)) process.stderr.write(line);
    else process.stdout.write(line);
  },
};

// Inside the test runner's own process the app is quiet unless a test
// captures; a started API (index.ts) sets the level from LOG_LEVEL.
const defaultLevel = (): LevelWithSilent => (process.env.NODE_ENV === 'test' ? 'silent' : 'info');

export const logger: Logger = pino(
  {
    level: defaultLevel(),
    base: { service: 'fryline-api' },
    redact: { paths: REDACT_PATHS, censor: '[redacted]' },
    timestamp: pino.stdTimeFunctions.isoTime,
  },
  destination,
);

/** Tests: every line written while capturing (at `level` and above), instead of stdout. */
export function captureLogs(level: LevelWithSilent = 'debug'): { lines: string[]; text: () => string; stop: () => void } {
  const lines: string[] = [];
  const sink: Sink = (line) => lines.push(line);
  const before = logger.level;
  logger.level = level;
  sinks.add(sink);
  return {
    lines,
    text: () => lines.join(''),
    stop() {
      sinks.delete(sink);
      logger.level = before;
    },
  };
}
