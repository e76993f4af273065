import type { AddressInfo } from 'node:net';
import { loadConfig, ConfigError } from './config/env.js';
import { connectDatabase, closeDatabase } from './db/sequelize.js';
import { createApp } from './app.js';
import { startJobs } from './jobs/index.js';

async function main() {
  const config = loadConfig(process.env);
  const sequelize = connectDatabase(config.DATABASE_URL);
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
  console.error(err instanceof ConfigError ? err.message : err);
  process.exit(1);
});
