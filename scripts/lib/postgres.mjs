// A project-local PostgreSQL cluster on loopback, run as the `postgres`
// user when we are root (initdb and postgres refuse to run as root).
import fs from 'node:fs';
import path from 'node:path';
import { aptInstall, isRoot, log, portIsFree, run, SetupError } from './shell.mjs';

function findBinDir() {
  const base = '/usr/lib/postgresql';
  if (!fs.existsSync(base)) return null;
  const versions = fs
    .readdirSync(base)
    .filter((v) => fs.existsSync(path.join(base, v, 'bin/initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ? path.join(base, versions[0], 'bin') : null;
}

function asPostgres(cmd, args, opts = {}) {
  return isRoot ? run('runuser', ['-u', 'postgres', '--', cmd, ...args], opts) : run(cmd, args, opts);
}

function chownToPostgres(dir) {
  if (isRoot) run('chown', ['-R', 'postgres:postgres', dir], { quiet: true });
}

/**
 * Makes sure a cluster exists in `dataDir` and runs on `port`.
 * Returns { bin, stop(), started } — `started` is false when it was already running.
 * `durable: false` (tests only) turns off fsync for speed.
 */
export async function ensurePostgres({ dataDir, port, durable = true }) {
  let bin = findBinDir();
  if (!bin) {
    aptInstall(['postgresql'], 'the PostgreSQL server (initdb, pg_ctl)');
    bin = findBinDir();
    if (!bin) throw new SetupError('PostgreSQL was installed but initdb was not found under /usr/lib/postgresql/*/bin');
  }
  const pgData = path.join(dataDir, 'pg');
  const socketDir = path.join(dataDir, 'run');
  fs.mkdirSync(socketDir, { recursive: true });
  if (isRoot) {
    // the postgres user must be able to reach the data folder
    fs.chmodSync(dataDir, 0o755);
  }

  if (!fs.existsSync(path.join(pgData, 'PG_VERSION'))) {
    log(`creating a PostgreSQL cluster in ${path.relative(process.cwd(), pgData) || pgData}`);
    fs.mkdirSync(pgData, { recursive: true });
    chownToPostgres(dataDir);
    asPostgres(path.join(bin, 'initdb'), ['-D', pgData, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], { quiet: true });
  }
  chownToPostgres(dataDir);

  const status = asPostgres(path.join(bin, 'pg_ctl'), ['-D', pgData, 'status'], { quiet: true, allowFail: true });
  let started = false;
  if (status.status !== 0) {
    if (!(await portIsFree(port))) {
      throw new SetupError(`port ${port} (PostgreSQL) is already in use by another program. Set PGPORT to a free port.`);
    }
    log(`starting PostgreSQL on 127.0.0.1:${port}`);
    asPostgres(
      path.join(bin, 'pg_ctl'),
      [
        '-D', pgData, '-l', path.join(dataDir, 'postgres.log'), '-w', '-t', '60',
        '-o', `-p ${port} -k ${socketDir} -c listen_addresses=127.0.0.1 -c max_connections=200${durable ? '' : ' -c fsync=off -c synchronous_commit=off'}`,
        'start',
      ],
      { quiet: true },
    );
    started = true;
  } else {
    log(`PostgreSQL already running in ${pgData}`);
  }

  return {
    bin,
    started,
    createDatabase(name) {
      const exists = run(path.join(bin, 'psql'), ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', '-tAc', `SELECT 1 FROM pg_database WHERE datname = '${name}'`], { quiet: true });
      if (exists.stdout.trim() !== '1') {
        run(path.join(bin, 'createdb'), ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', name], { quiet: true });
      }
      return `postgres://postgres@127.0.0.1:${port}/${name}`;
    },
    stop() {
      asPostgres(path.join(bin, 'pg_ctl'), ['-D', pgData, '-m', 'fast', '-w', 'stop'], { quiet: true, allowFail: true });
    },
  };
}
