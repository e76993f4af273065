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
  const sequelize = connectDatabase(config.DATABASE_URL);
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

  let closing = false;
  const shutdown = async () => {
    // Ctrl-C reaches us directly and again through the start command: close once
    if (closing) return;
    closing = true;
    server.close();
    await stopJobs();
    await app.closeResources();
    await closeDatabase();
    process.exit(0);
  };
  process.once('SIGINT', shutdown);
  process.once('SIGTERM', shutdown);
}

main().catch((err) => {
  if (err instanceof ConfigError) logger.fatal(err.message);
  else logger.fatal({ err }, 'Fryline cannot start');
  process.exit(1);
});
