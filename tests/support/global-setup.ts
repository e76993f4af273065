import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { TestProject } from 'vitest/node';
import { startMailFake } from '@fryline/fake-mail';
import { startOAuthFake } from '@fryline/fake-oauth';
import { startPaymentsFake } from '@fryline/fake-payments';
import { createApp } from '@fryline/api';
import { loadConfig } from '@fryline/api/config';
import { connectDatabase, closeDatabase, migrate } from '@fryline/api/db';
import { startJobs } from '@fryline/api/jobs/index';
import { seedDemo } from '@fryline/seeds';

declare module 'vitest' {
  export interface ProvidedContext {
    stack: { appUrl: string; mailUrl: string; paymentsUrl: string; oauthUrl: string };
  }
}

/** The whole product as `npm start` runs it, on free ports and its own database. */
export default async function setup(project: TestProject) {
  const databaseUrl = process.env.TEST_E2E_DATABASE_URL;
  if (!databaseUrl) throw new Error('TEST_E2E_DATABASE_URL is not set: run the tests with `npm test`');
  const sequelize = connectDatabase(databaseUrl);
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
  await migrate(sequelize);
  await seedDemo(new Date());

  const server = http.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const appUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const mail = await startMailFake({ smtpPort: 0, httpPort: 0 });
  const oauth = await startOAuthFake({ port: 0, clients: [{ clientId: 'fryline-e2e', clientSecret: 'fryline-e2e-secret', redirectUris: [`${appUrl}/auth/google/callback`] }] });
  const payments = await startPaymentsFake({ port: 0, webhookUrl: `${appUrl}/webhooks/payments`, webhookSecret: 'whsec_e2e', retryDelaysMs: [200, 400, 800] });
  const config = loadConfig({
    NODE_ENV: 'test',
    PORT: String((server.address() as AddressInfo).port),
    PUBLIC_URL: appUrl,
    DATABASE_URL: databaseUrl,
    OAUTH_URL: oauth.url,
    OAUTH_CLIENT_ID: 'fryline-e2e',
    OAUTH_CLIENT_SECRET: 'fryline-e2e-secret',
    STRIPE_API_URL: payments.url,
    STRIPE_SECRET_KEY: 'sk_test_e2e',
    STRIPE_WEBHOOK_SECRET: 'whsec_e2e',
    SMTP_PORT: String(mail.smtpPort),
    // Every journey signs in from 127.0.0.1, several times each: the per-address
    // sign-in limit (tested on its own in apps/api) would answer 429 part-way
    // through the run.
    RATE_LIMIT_SIGNIN: '100000',
  });
  const app = createApp(config);
  server.on('request', app);
  const stopJobs = startJobs(config, sequelize);
  project.provide('stack', { appUrl, mailUrl: mail.url, paymentsUrl: payments.url, oauthUrl: oauth.url });

  return async () => {
    await stopJobs();
    server.closeAllConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await Promise.all([mail.close(), oauth.close(), payments.close()]);
    await app.closeResources();
    await closeDatabase();
  };
}
