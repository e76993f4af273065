// The start command's database step: migrate, then load the demo scenario.
// Run as a script: `node --import tsx seeds/src/setup.ts` with DATABASE_URL set.
import { connectDatabase, closeDatabase, migrate } from '@fryline/api/db';
import { seedDemo } from './demo.js';

const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set');
  process.exit(1);
}
const sequelize = connectDatabase(url, { poolMax: 2 });
try {
  const applied = await migrate(sequelize);
  const seeded = await seedDemo(new Date());
  console.log(
    `database ready: ${applied.length ? `applied ${applied.join(', ')}` : 'no new migrations'}; ` +
      `demo ${seeded.createdBase ? 'loaded' : 'already present'}` +
      (seeded.createdBakeDays ? `, added ${seeded.createdBakeDays} upcoming bake days` : ''),
  );
} finally {
  await closeDatabase();
}
