// `npm test`: the same set-up as `npm start`, on its own PostgreSQL cluster,
// databases and ports, then every test — unit, API against the real
// PostgreSQL, and end-to-end in Debian's Chromium. Ends with one line
// "N passed, N failed".
import fs from 'node:fs';
import path from 'node:path';
import { spawn } from 'node:child_process';
import { aptInstall, buildApps, ensurePnpm, installDependencies, log, root, SetupError } from './lib/shell.mjs';
import { ensurePostgres } from './lib/postgres.mjs';

async function main() {
  const pnpm = ensurePnpm();
  installDependencies(pnpm);
  if (!fs.existsSync('/usr/bin/chromium')) aptInstall(['chromium'], "Debian's Chromium (for the browser tests)");

  const dataDir = process.env.TEST_DATA_DIR ? path.resolve(process.env.TEST_DATA_DIR) : path.join(root, '.test-data');
  const pgPort = Number(process.env.TEST_PGPORT ?? 5434);
  // The browser journeys get a PostgreSQL of their own (the next port), so the
  // API tests, one of which stops and starts its server on purpose, can run
  // beside them.
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
    // Two runs one after the other: side by side they took longer on two cores
    // (the browser journeys and the API tests each want both).
    log('running the tests: unit and API first, then the browser journeys');
    const lanes = [
      { name: 'main', projects: ['!e2e'], results: path.join(dataDir, 'results.json') },
      { name: 'e2e', projects: ['e2e'], results: path.join(dataDir, 'results-e2e.json') },
    ];
    const statuses = [];
    for (const lane of lanes) statuses.push(await runLane(lane, env));
    code = statuses.every((status) => status === 0) ? 0 : 1;
    let passed = 0;
    let failed = 0;
    let skipped = 0;
    let total = 0;
    for (const lane of lanes) {
      if (!fs.existsSync(lane.results)) {
        console.log(`\nthe ${lane.name} lane wrote no results`);
        failed += 1;
        continue;
      }
      const summary = JSON.parse(fs.readFileSync(lane.results, 'utf8'));
      passed += summary.numPassedTests;
      failed += summary.numFailedTests + (summary.numFailedTestSuites && !summary.numFailedTests ? summary.numFailedTestSuites : 0);
      skipped += summary.numPendingTests;
      total += summary.numTotalTests;
    }
    if (total === 0 || failed > 0) code = 1;
    console.log(`\n${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
  } finally {
    pg.stop();
    pgE2e.stop();
  }
  process.exit(code);
}

/** One vitest run over some projects, printing to the console. */
function runLane(lane, env) {
  const args = ['run', ...lane.projects.map((p) => `--project=${p}`), '--reporter=default', '--reporter=json', `--outputFile.json=${lane.results}`];
  return new Promise((resolve) => {
    const child = spawn(path.join(root, 'node_modules/.bin/vitest'), args, { cwd: root, env, stdio: ['ignore', 'inherit', 'inherit'] });
    child.on('error', (err) => {
      console.error(`the ${lane.name} lane could not start: ${err.message}`);
      resolve(1);
    });
    child.on('exit', (status, signal) => {
      resolve(signal ? 1 : status ?? 1);
    });
  });
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
