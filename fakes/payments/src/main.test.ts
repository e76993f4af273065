import { spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const main = fileURLToPath(new URL('./main.ts', import.meta.url));

function run(env: Record<string, string>) {
  const child = spawn(process.execPath, ['--import', 'tsx', main], {
    cwd: fileURLToPath(new URL('..', import.meta.url)),
    env: { ...process.env, ...env },
  });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (chunk: Buffer) => (stdout += chunk.toString()));
  child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  return { child, exited, output: () => ({ stdout, stderr }) };
}

async function until(check: () => boolean, timeoutMs = 10_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > deadline) throw new Error('timed out');
    await new Promise((resolve) => setTimeout(resolve, 25));
  }
}

describe('main (start from the environment)', () => {
  it('starts, logs its URL and answers', async () => {
    const proc = run({ PAYMENTS_FAKE_PORT: '0', PAYMENTS_WEBHOOK_URL: '' });
    try {
      await until(() => /listening on http:\/\/127\.0\.0\.1:\d+/.test(proc.output().stdout));
      const url = /listening on (http:\/\/127\.0\.0\.1:\d+)/.exec(proc.output().stdout)![1]!;
      const state = (await (await fetch(`${url}/__admin/state`)).json()) as { webhook: unknown };
      expect(state.webhook).toMatchObject({ url: null, secret: 'whsec_fryline_local' });
    } finally {
      proc.child.kill('SIGTERM');
      await proc.exited;
    }
  });

  it('says clearly when the port is taken', async () => {
    const blocker = createServer();
    await new Promise<void>((resolve) => blocker.listen(0, '127.0.0.1', resolve));
    const port = (blocker.address() as { port: number }).port;
    try {
      const proc = run({ PAYMENTS_FAKE_PORT: String(port) });
      expect(await proc.exited).toBe(1);
      expect(proc.output().stderr).toContain(`port ${port} is already in use (payments fake) — set PAYMENTS_FAKE_PORT`);
    } finally {
      blocker.close();
    }
  });
});
