// The start command's database step: migrate, then load the demo scenario.
// Run as a script: `node --import tsx seeds/src/setup.ts` with DATABASE_URL set.
import { connectDatabase, closeDatabase, migrate } from '@fryline/api/db';
import { createPaymentsClient } from '@fryline/api/integrations/payments';
import { loadConfig } from '@fryline/api/config';
import { seedDemo } from './demo.js';
import { seedDemoPayments } from './demo-payments.js';

const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set');
  process.exit(1);
}
const sequelize = connectDatabase(url, { poolMax: 2 });
try {
  const applied = await migrate(sequelize);
  const seeded = await seedDemo(new Date());
  // with the payments stand-in running (the start command starts it first), the demo's paid orders get real payments there
  let payments = 0;
  if (process.env.STRIPE_API_URL) {
    const config = loadConfig(process.env);
    payments = await seedDemoPayments(createPaymentsClient(config), config.STRIPE_API_URL.replace(/\/$/, ''), config.publicUrl);
  }
  console.log(
    `database ready: ${applied.length ? `applied ${applied.join(', ')}` : 'no new migrations'}; ` +
      `demo ${seeded.createdBase ? 'loaded' : 'already present'}` +
      (seeded.createdBakeDays ? `, added ${seeded.createdBakeDays} upcoming bake days` : '') +
      (payments ? `, ${payments} demo payments made at the payments stand-in` : ''),
  );
} finally {
  await closeDatabase();
}
