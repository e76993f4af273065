import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import pg from 'pg';

// The start command's database step (migrate + demo) run twice in a row on a
// fresh database: the demo scenario is there exactly once.
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

describe("the start command's set-up", () => {
  it('run twice finds the demo data once, and keeps what users created', async () => {
    const url = process.env.TEST_SETUP_DATABASE_URL;
    if (!url) throw new Error('TEST_SETUP_DATABASE_URL is not set: run the tests with `npm test`');
    const client = new pg.Client({ connectionString: url });
    await client.connect();
    try {
      await client.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
      const run = () => execFileSync(process.execPath, ['--import', 'tsx', 'seeds/src/setup.ts'], { cwd: root, env: { ...process.env, DATABASE_URL: url }, encoding: 'utf8' });
      expect(run()).toMatch(/demo loaded/);
      await client.query(`INSERT INTO users (email, name, role) VALUES ('made.by.hand@example.test', 'Hand Made', 'customer')`);
      const counts = async () =>
        (
          await client.query(`SELECT
            (SELECT count(*)::int FROM users) AS users,
            (SELECT count(*)::int FROM menu_items) AS menu,
            (SELECT count(*)::int FROM bake_days) AS days,
            (SELECT count(*)::int FROM orders) AS orders,
            (SELECT count(*)::int FROM formula_versions) AS formulas`)
        ).rows[0];
      const before = await counts();
      expect(run()).toMatch(/no new migrations; demo already present/);
      expect(await counts()).toEqual(before);
      expect(before).toMatchObject({ menu: 7, days: 3, orders: 10, formulas: 1 });
      const accounts = await client.query(`SELECT email, role FROM users WHERE email LIKE '%@fryline.test' ORDER BY email`);
      expect(accounts.rows).toEqual([
        { email: 'baker@fryline.test', role: 'baker' },
        { email: 'counter@fryline.test', role: 'counter' },
        { email: 'customer@fryline.test', role: 'customer' },
        { email: 'owner@fryline.test', role: 'owner' },
      ]);
      const open = await client.query(`SELECT count(*)::int AS n FROM bake_days WHERE status = 'published' AND cutoff_at > now() AND rings_remaining > 0`);
      expect(open.rows[0].n).toBeGreaterThanOrEqual(1);
    } finally {
      await client.end();
    }
  });
});
