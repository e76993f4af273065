import { PortInUseError } from './listen.js';
import { startMailFake } from './server.js';

function portFromEnv(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    console.error(`${name}=${raw} is not a port number (0-65535).`);
    process.exit(1);
  }
  return port;
}

const smtpPort = portFromEnv('SMTP_PORT', 2525);
const httpPort = portFromEnv('MAIL_INBOX_PORT', 3103);
const host = process.env.MAIL_FAKE_HOST || '127.0.0.1';

try {
  const fake = await startMailFake({ smtpPort, httpPort, host });
  console.log(`mail stand-in: SMTP on ${host}:${fake.smtpPort}, inbox at ${fake.url}`);
  const stop = () => {
    fake.close().then(() => process.exit(0), () => process.exit(1));
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
} catch (err) {
  if (err instanceof PortInUseError) {
    const envVar = err.service === 'smtp' ? 'SMTP_PORT' : 'MAIL_INBOX_PORT';
    console.error(`Port ${err.port} on ${err.host} (${err.service.toUpperCase()}) is already in use. Stop whatever holds it or set ${envVar} to a free port.`);
  } else {
    console.error(`mail stand-in failed to start: ${err instanceof Error ? err.message : String(err)}`);
  }
  process.exit(1);
}
