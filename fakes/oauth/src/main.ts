import { PortInUseError, startOAuthFake } from './server.js';

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

const port = portFromEnv('OAUTH_FAKE_PORT', 3101);
const host = process.env.OAUTH_FAKE_HOST || '127.0.0.1';
const clientId = process.env.OAUTH_CLIENT_ID || 'fryline-local';
const clientSecret = process.env.OAUTH_CLIENT_SECRET || 'fryline-local-secret';
const redirectUris = (
  process.env.OAUTH_REDIRECT_URIS || 'http://127.0.0.1:3000/auth/google/callback,http://localhost:3000/auth/google/callback'
)
  .split(',')
  .map((s) => s.trim())
  .filter(Boolean);

try {
  const fake = await startOAuthFake({ port, host, clients: [{ clientId, clientSecret, redirectUris }] });
  console.log(`sign-in stand-in listening on ${fake.url} (client ${clientId}; redirect URIs: ${redirectUris.join(', ')})`);
  const stop = () => {
    fake.close().then(() => process.exit(0), () => process.exit(1));
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
} catch (err) {
  if (err instanceof PortInUseError) {
    console.error(`Port ${err.port} on ${err.host} is already in use. Stop whatever holds it or set OAUTH_FAKE_PORT to a free port.`);
  } else {
    console.error(`sign-in stand-in failed to start: ${err instanceof Error ? err.message : String(err)}`);
  }
  process.exit(1);
}
