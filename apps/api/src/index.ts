import type { AddressInfo } from 'node:net';
import { loadConfig, ConfigError } from './config/env.js';
import { connectDatabase, closeDatabase } from './db/sequelize.js';
import { createApp } from './app.js';
import { startJobs } from './jobs/index.js';

async function main() {
  const config = loadConfig(process.env);
  const sequelize = connectDatabase(config.DATABASE_URL, { poolMax: config.DB_POOL_MAX });
  const app = createApp(config);
  const stopJobs = config.JOBS === 'on' ? startJobs(config, sequelize) : async () => {};

  const server = app.listen(config.PORT, config.HOST);
  server.on('error', (err: NodeJS.ErrnoException) => {
    if (err.code === 'EADDRINUSE') {
      console.error(`Fryline cannot start: port ${config.PORT} is already in use. Set PORT to a free port.`);
    } else {
      console.error('Fryline cannot start:', err.message);
    }
    process.exit(1);
  });
  server.on('listening', () => {
    const { port } = server.address() as AddressInfo;
    console.log(`Fryline API listening on http://${config.HOST}:${port} (public address ${config.publicUrl})`);
  });

  // SIGTERM (or Ctrl-C): stop accepting, let the requests in flight finish
  // (up to SHUTDOWN_GRACE_MS), stop the jobs, close the pools, exit.
  let closing = false;
  const shutdown = async (signal: string) => {
    // Ctrl-C reaches us directly and again through the start command: close once
    if (closing) return;
    closing = true;
    console.log(`Fryline API: ${signal}, finishing the requests in flight`);
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeIdleConnections();
    const grace = setTimeout(() => server.closeAllConnections(), config.SHUTDOWN_GRACE_MS);
    await closed;
    clearTimeout(grace);
    await stopJobs();
    await app.closeResources();
    await closeDatabase();
    console.log('Fryline API: stopped');
    process.exit(0);
  };
  process.once('SIGINT', () => void shutdown('SIGINT'));
  process.once('SIGTERM', () => void shutdown('SIGTERM'));
  // a stray rejected promise is a bug to log, not a reason to drop every customer's request
  process.on('unhandledRejection', (reason) => console.error('[api] unhandled rejection:', reason));
}

main().catch((err) => {
  console.error(err instanceof ConfigError ? err.message : err);
  process.exit(1);
});
