import type { AddressInfo } from 'node:net';
import { loadConfig, ConfigError } from './config/env.js';
import { connectDatabase, closeDatabase } from './db/sequelize.js';
import { createApp } from './app.js';
import { startJobs } from './jobs/index.js';
import { logger } from './lib/logger.js';

async function main() {
  logger.level = 'info';
  const config = loadConfig(process.env);
  logger.level = config.LOG_LEVEL;
  const sequelize = connectDatabase(config.DATABASE_URL, { poolMax: config.DB_POOL_MAX });
  const app = createApp(config);
  const stopJobs = config.JOBS === 'on' ? startJobs(config, sequelize) : async () => {};

  const server = app.listen(config.PORT, config.HOST);
  server.on('error', (err: NodeJS.ErrnoException) => {
    if (err.code === 'EADDRINUSE') {
      logger.fatal(`Fryline cannot start: port ${config.PORT} is already in use. Set PORT to a free port.`);
    } else {
      logger.fatal({ err }, `Fryline cannot start: ${err.message}`);
    }
    process.exit(1);
  });
  server.on('listening', () => {
    const { port } = server.address() as AddressInfo;
    logger.info({ port, publicUrl: config.publicUrl }, `Fryline API listening on http://${config.HOST}:${port} (public address ${config.publicUrl})`);
  });

  // SIGTERM (or Ctrl-C): stop accepting, let the requests in flight finish
  // (up to SHUTDOWN_GRACE_MS), stop the jobs, close the pools, exit.
  let closing = false;
  const shutdown = async (signal: string) => {
    // Ctrl-C reaches us directly and again through the start command: close once
    if (closing) return;
    closing = true;
    logger.info({ signal }, 'Fryline API: finishing the requests in flight');
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeIdleConnections();
    const grace = setTimeout(() => server.closeAllConnections(), config.SHUTDOWN_GRACE_MS);
    await closed;
    clearTimeout(grace);
    await stopJobs();
    await app.closeResources();
    await closeDatabase();
    logger.info('Fryline API: stopped');
    process.exit(0);
  };
  process.once('SIGINT', () => void shutdown('SIGINT'));
  process.once('SIGTERM', () => void shutdown('SIGTERM'));
  // a stray rejected promise is a bug to log, not a reason to drop every customer's request
  process.on('unhandledRejection', (reason) => logger.error({ err: reason }, 'unhandled rejection'));
}

main().catch((err) => {
  if (err instanceof ConfigError) logger.fatal(err.message);
  else logger.fatal({ err }, 'Fryline cannot start');
  process.exit(1);
});
