// `npm test`: the same set-up as `npm start`, on its own PostgreSQL cluster,
// databases and ports, then every test — unit, API against the real
// PostgreSQL, and end-to-end in Debian's Chromium. Ends with one line
// "N passed, N failed".
import fs from 'node:fs';
import path from 'node:path';
import { aptInstall, buildApps, ensurePnpm, installDependencies, log, root, run, SetupError } from './lib/shell.mjs';
import { ensurePostgres } from './lib/postgres.mjs';

async function main() {
  const pnpm = ensurePnpm();
  installDependencies(pnpm);
  if (!fs.existsSync('/usr/bin/chromium')) aptInstall(['chromium'], "Debian's Chromium (for the browser tests)");

  const dataDir = process.env.TEST_DATA_DIR ? path.resolve(process.env.TEST_DATA_DIR) : path.join(root, '.test-data');
  const pgPort = Number(process.env.TEST_PGPORT ?? 5434);
  // a fresh cluster every run: tests never see yesterday's data. The browser
  // journeys get one of their own (the next port), which the API test that
  // stops and starts its server on purpose cannot touch.
  const e2eDir = path.join(dataDir, 'e2e');
  const e2ePort = Number(process.env.TEST_E2E_PGPORT ?? pgPort + 1);
  for (const [dir, port] of [[dataDir, pgPort], [e2eDir, e2ePort]]) (await ensurePostgresIfPresent(dir, port))?.stop();
  fs.rmSync(dataDir, { recursive: true, force: true });
  const pg = await ensurePostgres({ dataDir, port: pgPort, durable: false });
  const pgE2e = await ensurePostgres({ dataDir: e2eDir, port: e2ePort, durable: false });

  let code = 1;
  try {
    const env = {
      ...process.env,
      NODE_ENV: 'test',
      TEST_PG_ADMIN_URL: pg.createDatabase('postgres'),
      TEST_DATABASE_URL: pg.createDatabase('fryline_test'),
      TEST_E2E_DATABASE_URL: pgE2e.createDatabase('fryline_e2e'),
      TEST_SETUP_DATABASE_URL: pgE2e.createDatabase('fryline_setup'),
    };
    buildApps(pnpm);
    const results = path.join(dataDir, 'results.json');
    log('running the tests');
    const res = run(path.join(root, 'node_modules/.bin/vitest'), ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${results}`], {
      env,
      allowFail: true,
    });
    code = res.status ?? 1;
    if (fs.existsSync(results)) {
      const summary = JSON.parse(fs.readFileSync(results, 'utf8'));
      const failed = summary.numFailedTests + (summary.numFailedTestSuites && !summary.numFailedTests ? summary.numFailedTestSuites : 0);
      console.log(`\n${summary.numPassedTests} passed, ${failed} failed${summary.numPendingTests ? `, ${summary.numPendingTests} skipped` : ''}`);
      if (summary.numTotalTests === 0) code = 1;
    } else {
      console.log('\n0 passed, 1 failed');
      code = code || 1;
    }
  } finally {
    pg.stop();
    pgE2e.stop();
  }
  process.exit(code);
}

async function ensurePostgresIfPresent(dataDir, port) {
  if (!fs.existsSync(path.join(dataDir, 'pg/postmaster.pid'))) return null;
  try {
    return await ensurePostgres({ dataDir, port, durable: false });
  } catch {
    return null;
  }
}

main().catch((err) => {
  console.error(`\n${err instanceof SetupError ? err.message : err.stack}`);
  console.log('\n0 passed, 1 failed');
  process.exit(1);
});
