import { afterAll, beforeAll, beforeEach } from 'vitest';
import { seedDemo } from '@fryline/seeds';
import http from 'node:http';
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { AddressInfo } from 'node:net';
import { startMailFake } from '@fryline/fake-mail';
import { startOAuthFake } from '@fryline/fake-oauth';
import { startPaymentsFake } from '@fryline/fake-payments';
import { connectDatabase, database } from '../src/db/sequelize.js';
import { loadConfig, type Config } from '../src/config/env.js';
import { createApp } from '../src/app.js';

export const WEBHOOK_SECRET = 'whsec_api_tests';

/** Fresh data for each test: every table but the migration log emptied, the schema kept (new tables are covered by themselves). */
export async function resetData() {
  const [rows] = await database().query(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'schema_migrations'`,
  );
  const tables = (rows as { tablename: string }[]).map((r) => `"${r.tablename}"`);
  if (tables.length) await database().query(`TRUNCATE ${tables.join(', ')} RESTART IDENTITY CASCADE`);
}

export type Stack = Awaited<ReturnType<typeof startStack>>;

/**
 * The app listening on a free port, with the three fakes beside it, as the
 * start command wires them (only the ports differ).
 */
export async function startStack(overrides: Record<string, string> = {}) {
  connectDatabase(process.env.TEST_DATABASE_URL!);
  const server = http.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const port = (server.address() as AddressInfo).port;
  const url = `http://127.0.0.1:${port}`;
  const mail = await startMailFake({ smtpPort: 0, httpPort: 0 });
  const oauth = await startOAuthFake({
    port: 0,
    clients: [{ clientId: 'fryline-test', clientSecret: 'fryline-test-secret', redirectUris: [`${url}/auth/google/callback`] }],
  });
  const payments = await startPaymentsFake({ port: 0, webhookUrl: `${url}/webhooks/payments`, webhookSecret: WEBHOOK_SECRET, retryDelaysMs: [100, 200, 400] });
  const config: Config = loadConfig({
    NODE_ENV: 'test',
    PORT: String(port),
    PUBLIC_URL: url,
    DATABASE_URL: process.env.TEST_DATABASE_URL,
    OAUTH_URL: oauth.url,
    OAUTH_CLIENT_ID: 'fryline-test',
    OAUTH_CLIENT_SECRET: 'fryline-test-secret',
    STRIPE_API_URL: payments.url,
    STRIPE_SECRET_KEY: 'sk_test_api_tests',
    STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
    SMTP_PORT: String(mail.smtpPort),
    JOBS: 'off',
    ...overrides,
  });
  const app = createApp(config);
  server.on('request', app);
  return {
    url,
    port,
    config,
    app,
    mail,
    oauth,
    payments,
    async close() {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeAllConnections();
      await Promise.all([mail.close(), oauth.close(), payments.close()]);
      await app.closeResources();
    },
  };
}

/** A minimal browser: one cookie jar, redirects followed by hand so each hop can be checked. */
export class Browser {
  private cookies = new Map<string, string>();

  constructor(private readonly base: string) {}

  cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  hasCookie(name: string) {
    return this.cookies.has(name);
  }

  private keep(res: Response) {
    for (const line of res.headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(';');
      const [name, ...rest] = pair!.split('=');
      const value = rest.join('=');
      const expired = attrs.some((a) => /^\s*expires=Thu, 01 Jan 1970/i.test(a)) || value === '';
      if (expired) this.cookies.delete(name!.trim());
      else this.cookies.set(name!.trim(), value);
    }
  }

  async fetch(path: string, init: RequestInit = {}): Promise<Response> {
    const target = path.startsWith('http') ? path : `${this.base}${path}`;
    const sameSite = target.startsWith(this.base);
    const headers = new Headers(init.headers);
    if (sameSite && this.cookies.size) headers.set('cookie', this.cookieHeader());
    const res = await fetch(target, { ...init, headers, redirect: 'manual' });
    if (sameSite) this.keep(res);
    return res;
  }

  async csrf(): Promise<string> {
    const res = await this.fetch('/api/csrf');
    return ((await res.json()) as any as { token: string }).token;
  }

  /** JSON request with the CSRF token, as the apps send it. */
  async send(method: string, path: string, body?: unknown, headers: Record<string, string> = {}) {
    const token = await this.csrf();
    const res = await this.fetch(path, {
      method,
      headers: { 'content-type': 'application/json', 'x-csrf-token': token, ...headers },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await res.text();
    return { status: res.status, body: (text ? JSON.parse(text) : null) as any };
  }

  async getJson(path: string) {
    const res = await this.fetch(path);
    return { status: res.status, body: (await res.json()) as any };
  }
}

/**
 * Signs in through the real flow: the app's /auth/google redirect, the
 * sign-in fake's chooser form, the callback. Returns where the app sent us.
 */
export async function signIn(browser: Browser, email: string, opts: { returnTo?: string; deny?: boolean; tamperState?: boolean; verified?: boolean } = {}) {
  const start = await browser.fetch(`/auth/google?returnTo=${encodeURIComponent(opts.returnTo ?? '/')}`);
  if (start.status !== 302) throw new Error(`sign-in start answered ${start.status}`);
  const authorize = new URL(start.headers.get('location')!);
  const form = new URLSearchParams(authorize.searchParams);
  if (opts.deny) form.set('decision', 'deny');
  else {
    form.set('email', email);
    form.set('email_verified', opts.verified === false ? 'false' : 'true');
  }
  const chosen = await fetch(`${authorize.origin}/authorize`, { method: 'POST', body: form, redirect: 'manual' });
  const callback = new URL(chosen.headers.get('location')!);
  if (opts.tamperState) callback.searchParams.set('state', 'forged-state-value');
  const done = await browser.fetch(callback.pathname + callback.search);
  return { status: done.status, location: done.headers.get('location'), callback };
}

/** The demo customer and the owner, each signed in through the real flow in a browser of their own. */
export async function customerAndOwner(stack: Stack): Promise<{ customer: Browser; owner: Browser }> {
  const customer = new Browser(stack.url);
  await signIn(customer, 'customer@fryline.test');
  const owner = new Browser(stack.url);
  await signIn(owner, 'owner@fryline.test');
  return { customer, owner };
}

/**
 * Starts the stack once for a test file and gives every test fresh data:
 * tables emptied, the fakes reset, and (unless `demo: false`) the demo
 * scenario loaded. Returns the stack through a proxy, usable once the
 * file's beforeAll has run.
 */
export function useStack(opts: { demo?: boolean; env?: Record<string, string>; fresh?: 'each' | 'once' } = {}): Stack {
  let current: Stack | null = null;
  const fresh = async () => {
    await resetData();
    current!.payments.reset();
    current!.mail.clear();
    if (opts.demo !== false) await seedDemo(new Date());
  };
  beforeAll(async () => {
    current = await startStack(opts.env);
    if (opts.fresh === 'once') await fresh();
  });
  afterAll(async () => current?.close());
  // 'once' is for files whose tests write nothing (and assert so)
  if (opts.fresh !== 'once') beforeEach(fresh);
  return new Proxy({} as Stack, {
    get(_target, key) {
      if (!current) throw new Error('the stack starts in beforeAll');
      return current[key as keyof Stack];
    },
  });
}

/**
 * A second API process (`node --import tsx src/index.ts`) on the same
 * database and fakes as `stack`, as a deployment behind a proxy runs it.
 * Resolves with its URL once it listens; `env` adds or overrides settings.
 */
export async function spawnApi(stack: Stack, env: Record<string, string> = {}): Promise<{ url: string; child: ChildProcess; output: () => string }> {
  const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
  const child = spawn(process.execPath, ['--import', 'tsx', 'src/index.ts'], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: '0',
      JOBS: 'off',
      PUBLIC_URL: stack.url,
      DATABASE_URL: stack.config.DATABASE_URL,
      SESSION_SECRET: stack.config.SESSION_SECRET,
      STRIPE_API_URL: stack.config.STRIPE_API_URL,
      STRIPE_SECRET_KEY: stack.config.STRIPE_SECRET_KEY,
      STRIPE_WEBHOOK_SECRET: stack.config.STRIPE_WEBHOOK_SECRET,
      OAUTH_URL: stack.config.OAUTH_URL,
      OAUTH_CLIENT_ID: stack.config.OAUTH_CLIENT_ID,
      OAUTH_CLIENT_SECRET: stack.config.OAUTH_CLIENT_SECRET,
      SMTP_PORT: String(stack.config.SMTP_PORT),
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  const url = await new Promise<string>((resolve, reject) => {
    child.stdout!.on('data', (chunk) => {
      out += chunk;
      const m = /listening on .*?:(\d+)/.exec(out);
      if (m) resolve(`http://127.0.0.1:${m[1]}`);
    });
    child.stderr!.on('data', (chunk) => (out += chunk));
    child.on('exit', (code) => reject(new Error(`second API exited ${code}: ${out}`)));
  });
  return { url, child, output: () => out };
}
