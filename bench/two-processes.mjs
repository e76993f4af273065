// The opening rush through nginx in front of two API processes, beside the
// same rush on one process (prints figures; asserts nothing).
//
// Needs a running stack (see bench/opening-rush.mjs for the command) and
// nginx from Debian's packages (`apt-get install -y nginx-light`). Starts a
// second API process on SECOND_PORT (3210) with the stack's settings, and
// nginx on NGINX_PORT (3204) with a config written here, balancing the two;
// stops both at the end.
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { env, fire, fmt, machine, oversold, printRun, roomForEveryone, signInMany } from './lib/rush.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const first = (env.BASE_URL ?? 'http://127.0.0.1:3200').replace(/\/$/, '');
const databaseUrl = env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5455/fryline';
const secondPort = Number(env.SECOND_PORT ?? 3210);
const nginxPort = Number(env.NGINX_PORT ?? 3204);
const customersWanted = Number(env.CUSTOMERS ?? 1000);
const connections = Number(env.CONNECTIONS ?? 100);
const run = `two${Date.now().toString(36)}`;

const nginx = spawnSync('sh', ['-c', 'command -v nginx || ls /usr/sbin/nginx'], { encoding: 'utf8' }).stdout.trim().split('\n')[0];
if (!nginx) {
  console.error('nginx is not installed: apt-get install -y nginx-light');
  process.exit(1);
}

// the second API process: the first one's settings, another port, no jobs of its own needed but allowed
const firstPort = Number(new URL(first).port);
const second = spawn(process.execPath, ['--import', 'tsx', 'apps/api/src/index.ts'], {
  cwd: root,
  env: {
    ...process.env,
    PORT: String(secondPort),
    PUBLIC_URL: env.PUBLIC_URL ?? first,
    DATABASE_URL: databaseUrl,
    OAUTH_URL: env.OAUTH_URL ?? `http://127.0.0.1:${Number(env.OAUTH_FAKE_PORT ?? firstPort + 1)}`,
    STRIPE_API_URL: env.STRIPE_API_URL ?? `http://127.0.0.1:${Number(env.PAYMENTS_FAKE_PORT ?? firstPort + 2)}`,
    SMTP_PORT: env.SMTP_PORT ?? '2625',
    RATE_LIMIT_SIGNIN: env.RATE_LIMIT_SIGNIN ?? '100000',
    RATE_LIMIT_ORDERS: env.RATE_LIMIT_ORDERS ?? '100000',
  },
  stdio: ['ignore', 'pipe', 'inherit'],
});
await new Promise((resolve, reject) => {
  let out = '';
  second.stdout.on('data', (chunk) => {
    out += chunk;
    if (/listening on/.test(out)) resolve();
  });
  second.once('exit', (code) => reject(new Error(`second API process exited (${code}): ${out}`)));
});

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'fryline-nginx-'));
fs.mkdirSync(path.join(dir, 'logs'));
fs.writeFileSync(
  path.join(dir, 'nginx.conf'),
  `worker_processes 1;
pid ${dir}/nginx.pid;
error_log ${dir}/logs/error.log warn;
events { worker_connections 4096; }
http {
  access_log off;
  client_body_temp_path ${dir}/body;
  proxy_temp_path ${dir}/proxy;
  fastcgi_temp_path ${dir}/fastcgi;
  uwsgi_temp_path ${dir}/uwsgi;
  scgi_temp_path ${dir}/scgi;
  upstream fryline {
    least_conn;
    server 127.0.0.1:${firstPort};
    server 127.0.0.1:${secondPort};
    keepalive 64;
  }
  server {
    listen 127.0.0.1:${nginxPort};
    location / {
      proxy_pass http://fryline;
      proxy_http_version 1.1;
      proxy_set_header Connection "";
      proxy_set_header Host $http_host;
      proxy_set_header X-Forwarded-For $proxy_add_x_forwarded_for;
      proxy_set_header X-Forwarded-Proto $scheme;
    }
  }
}
`,
);
const started = spawnSync(nginx, ['-p', dir, '-c', path.join(dir, 'nginx.conf')], { encoding: 'utf8' });
if (started.status !== 0) throw new Error(`nginx did not start: ${started.stderr}`);
const proxied = `http://127.0.0.1:${nginxPort}`;

try {
  console.log(`Opening rush: one process (${first}) and two behind nginx (${proxied})`);
  console.log(`machine: ${machine(databaseUrl)}`);
  const results = {};
  for (const [label, base] of [['one process', first], ['two processes behind nginx', proxied]]) {
    const { customers } = await signInMany(base, customersWanted, `${run}-${label.length}`);
    const { day, body } = await roomForEveryone(base, databaseUrl, customers.length);
    const result = await fire(base, customers, body, connections);
    printRun(`${label}, ${connections} in flight`, result);
    const ledger = oversold(databaseUrl, day.id);
    console.log(`  oversold pieces: ${ledger.oversold}; ledger ${ledger.balanced ? 'balanced' : 'NOT BALANCED'}`);
    results[label] = result.perSecond;
  }
  console.log(`rate: one process ${fmt(results['one process'], 1)} orders/s, two behind nginx ${fmt(results['two processes behind nginx'], 1)} orders/s`);
} finally {
  spawnSync(nginx, ['-p', dir, '-c', path.join(dir, 'nginx.conf'), '-s', 'quit']);
  second.kill('SIGTERM');
  fs.rmSync(dir, { recursive: true, force: true });
}
