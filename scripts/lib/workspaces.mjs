// The workspaces listed in pnpm-workspace.yaml, and a type-check of each with
// its own tsconfig.json. Shared by `npm run typecheck` and the structure
// tests that `npm test` runs. Plain Node: no dependencies of its own.
import { execFile } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { root } from './shell.mjs';

/** The folders the structure rules look at (every workspace that holds code). */
export const codeRoots = ['apps', 'packages', 'fakes', 'seeds', 'tests'];

/** Every workspace folder (relative to the repository root) with its package.json. */
export function listWorkspaces() {
  const yaml = fs.readFileSync(path.join(root, 'pnpm-workspace.yaml'), 'utf8');
  const block = yaml.split(/^packages:\s*$/m)[1] ?? '';
  const globs = [];
  for (const line of block.split('\n').slice(1)) {
    const m = /^\s+-\s+['"]?([^'"#]+?)['"]?\s*$/.exec(line);
    if (!m) break;
    globs.push(m[1]);
  }
  const dirs = globs.flatMap((glob) => {
    if (!glob.endsWith('/*')) return [glob];
    const parent = glob.slice(0, -2);
    return fs
      .readdirSync(path.join(root, parent), { withFileTypes: true })
      .filter((d) => d.isDirectory())
      .map((d) => `${parent}/${d.name}`);
  });
  return dirs
    .filter((dir) => fs.existsSync(path.join(root, dir, 'package.json')))
    .sort()
    .map((dir) => ({ dir, manifest: JSON.parse(fs.readFileSync(path.join(root, dir, 'package.json'), 'utf8')) }));
}

/**
 * Type-checks one workspace (typecheck-workspace.mjs: its tsconfig.json, errors
 * in its own files); resolves { dir, ok, output, ms }.
 */
export function typecheckWorkspace(dir) {
  const started = Date.now();
  const script = path.join(root, 'scripts/lib/typecheck-workspace.mjs');
  return new Promise((resolve) => {
    execFile(process.execPath, [script, dir], { cwd: root, maxBuffer: 64 * 1024 * 1024 }, (err, stdout, stderr) => {
      resolve({ dir, ok: !err, output: `${stdout}${stderr}`.trim(), ms: Date.now() - started });
    });
  });
}

/** Type-checks every workspace, a few at a time; resolves the results in workspace order. */
export async function typecheckAll({ concurrency = Math.max(1, os.availableParallelism()), onResult } = {}) {
  const dirs = listWorkspaces().map((w) => w.dir);
  const results = new Array(dirs.length);
  let next = 0;
  const worker = async () => {
    while (next < dirs.length) {
      const i = next++;
      results[i] = await typecheckWorkspace(dirs[i]);
      onResult?.(results[i]);
    }
  };
  await Promise.all(Array.from({ length: Math.min(concurrency, dirs.length) }, worker));
  return results;
}
