// Small process helpers for the start and test commands. Plain Node (no
// dependencies), because they run before anything is installed.
import { spawn, spawnSync } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

export class SetupError extends Error {}

export function log(message) {
  process.stdout.write(`\x1b[35m[fryline]\x1b[0m ${message}\n`);
}

/** Runs a command to completion; throws with its output on failure. */
export function run(cmd, args, opts = {}) {
  const res = spawnSync(cmd, args, { cwd: root, encoding: 'utf8', stdio: opts.quiet ? 'pipe' : 'inherit', ...opts });
  if (res.error) throw new SetupError(`${cmd} could not run: ${res.error.message}`);
  if (res.status !== 0 && !opts.allowFail) {
    const out = opts.quiet ? `\n${res.stdout ?? ''}${res.stderr ?? ''}` : '';
    throw new SetupError(`${cmd} ${args.join(' ')} failed with exit code ${res.status}${out}`);
  }
  return res;
}

/** Starts a long-running child; its output is prefixed with a tag. */
export function startChild(tag, cmd, args, env) {
  const child = spawn(cmd, args, { cwd: root, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  const prefix = (stream, out) => {
    let buffered = '';
    stream.on('data', (chunk) => {
      buffered += chunk.toString();
      const lines = buffered.split('\n');
      buffered = lines.pop() ?? '';
      for (const line of lines) out.write(`\x1b[36m${tag.padEnd(9)}\x1b[0m ${line}\n`);
    });
  };
  prefix(child.stdout, process.stdout);
  prefix(child.stderr, process.stderr);
  return child;
}

/** Resolves true when nothing listens on host:port. */
export function portIsFree(port, host = '127.0.0.1') {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve(false));
    server.once('listening', () => server.close(() => resolve(true)));
    server.listen(port, host);
  });
}

export async function assertPortsFree(ports) {
  const busy = [];
  for (const [name, port] of Object.entries(ports)) {
    if (!(await portIsFree(port))) busy.push(`port ${port} (${name}) is already in use`);
  }
  if (busy.length) {
    throw new SetupError(`${busy.join('\n')}\nStop whatever holds it, or choose another port with the environment variable shown in README.md.`);
  }
}

export async function waitForHttp(url, timeoutMs = 30_000) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    try {
      const res = await fetch(url);
      if (res.status < 500) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new SetupError(`${url} did not answer within ${timeoutMs / 1000} s`);
}

/** pnpm 12.4.2 installed inside the project, so no global install is needed. */
export function ensurePnpm() {
  const bin = path.join(root, '.tools/node_modules/.bin/pnpm');
  const probe = spawnSync(bin, ['--version'], { encoding: 'utf8' });
  if (probe.status === 0 && probe.stdout.trim() === '12.4.2') return bin;
  log('installing pnpm 12.4.2 into .tools/');
  run('npm', ['install', '--prefix', '.tools', '--no-save', '--no-package-lock', 'pnpm@12.4.2'], { quiet: true });
  return bin;
}

export function installDependencies(pnpm) {
  log('installing dependencies from the lockfile');
  run(pnpm, ['install', '--frozen-lockfile', '--reporter=append-only'], { quiet: true });
}

export function buildApps(pnpm) {
  log('building the shop and staff apps');
  run(pnpm, ['--filter', '@fryline/shop', '--filter', '@fryline/staff', 'run', 'build'], { quiet: true });
}

/** apt-get install for a missing system package, with a clear error when not root. */
export function aptInstall(packages, why) {
  if (!isRoot) {
    throw new SetupError(`${why} is missing. Install it first (as root): apt-get update && apt-get install -y ${packages.join(' ')}`);
  }
  log(`installing ${packages.join(' ')} from Debian's packages (${why})`);
  run('apt-get', ['update'], { quiet: true, env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  run('apt-get', ['install', '-y', '--no-install-recommends', ...packages], {
    quiet: true,
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
}
