import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { spawn } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { loadConfig, ConfigError } from '../src/config/env.js';
import { useStack } from './support.js';

const stack = useStack({ demo: false });

describe('health and error shapes', () => {
  it('reports the database up', async () => {
    const res = await request(stack.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, db: 'up' });
  });

  it('answers unknown API routes and bad JSON with the one error shape', async () => {
    const missing = await request(stack.app).get('/api/nope');
    expect(missing.status).toBe(404);
    expect(missing.body.error).toMatchObject({ code: 'not_found' });
    const bad = await request(stack.app).post('/api/orders').set('content-type', 'application/json').send('{"broken": ');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('invalid_json');
  });

  it('sends a same-origin content security policy and no framing', async () => {
    const res = await request(stack.app).get('/api/health');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['content-security-policy']).toContain("frame-ancestors 'none'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('validates ids in the path before touching the database', async () => {
    const res = await request(stack.app).get('/api/bake-days/not-a-uuid');
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: 'invalid', details: { fields: { id: expect.any(String) } } });
  });
});

describe('health with the database down', () => {
  it('answers 503 { ok: false, db: "down" } from an API whose database is unreachable', async () => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'src/index.ts'], {
      cwd: path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..'),
      // port 9 (discard) on loopback: nothing listens there
      env: { ...process.env, PORT: '0', JOBS: 'off', DATABASE_URL: 'postgres://postgres@127.0.0.1:9/nowhere' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    try {
      const url = await new Promise<string>((resolve, reject) => {
        let out = '';
        child.stdout!.on('data', (chunk) => {
          out += chunk;
          const m = /listening on (http:\/\/[^\s]+)/.exec(out);
          if (m) resolve(m[1]!);
        });
        child.on('exit', (code) => reject(new Error(`API exited ${code}`)));
      });
      const res = await fetch(`${url}/api/health`);
      expect(res.status).toBe(503);
      expect(await res.json()).toEqual({ ok: false, db: 'down' });
    } finally {
      child.kill('SIGTERM');
    }
  });

  it('names the port when it is already in use', async () => {
    const blocker = http.createServer();
    await new Promise<void>((r) => blocker.listen(0, '127.0.0.1', r));
    const port = (blocker.address() as AddressInfo).port;
    const child = spawn(process.execPath, ['--import', 'tsx', 'src/index.ts'], {
      cwd: path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..'),
      env: { ...process.env, PORT: String(port), JOBS: 'off', DATABASE_URL: 'postgres://postgres@127.0.0.1:9/nowhere' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let err = '';
    child.stderr!.on('data', (chunk) => (err += chunk));
    const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
    blocker.close();
    expect(code).toBe(1);
    expect(err).toContain(`port ${port} is already in use`);
  });

  it('stops at boot listing every bad setting', async () => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'src/index.ts'], {
      cwd: path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..'),
      env: { ...process.env, PORT: 'abc', SMTP_PORT: '99999', STRIPE_WEBHOOK_SECRET: 'nope' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let err = '';
    child.stderr!.on('data', (chunk) => (err += chunk));
    const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
    expect(code).toBe(1);
    for (const name of ['PORT', 'SMTP_PORT', 'STRIPE_WEBHOOK_SECRET']) expect(err).toContain(name);
  });
});

describe('configuration at boot', () => {
  it('lists every bad variable at once', () => {
    let error: unknown;
    try {
      loadConfig({ PORT: 'eighty', DATABASE_URL: 'mysql://x', STRIPE_SECRET_KEY: 'pk_live_nope', OAUTH_URL: 'not a url' });
    } catch (err) {
      error = err;
    }
    expect(error).toBeInstanceOf(ConfigError);
    const problems = (error as ConfigError).problems.join('\n');
    for (const name of ['PORT', 'DATABASE_URL', 'STRIPE_SECRET_KEY', 'OAUTH_URL']) expect(problems).toContain(name);
  });

  it('refuses the development session secret in production', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/SESSION_SECRET/);
  });

  it('uses the documented defaults', () => {
    const config = loadConfig({});
    expect(config).toMatchObject({ PORT: 3000, OAUTH_URL: 'http://127.0.0.1:3101', STRIPE_API_URL: 'http://127.0.0.1:3102', SMTP_PORT: 2525, HOLD_MINUTES: 10 });
    expect(config.DATABASE_URL).toContain(':5433/');
  });
});
