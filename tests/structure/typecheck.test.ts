// Every workspace type-checked with its own tsconfig.json, each file by the
// workspace it belongs to (the same check as `npm run typecheck`). A failure
// shows the compiler's errors, each with its file.
import { describe, expect, it } from 'vitest';
import { listWorkspaces, typecheckWorkspace } from '../../scripts/lib/workspaces.mjs';
import fs from 'node:fs';
import path from 'node:path';

const root = path.resolve(import.meta.dirname, '../..');
const workspaces = listWorkspaces().map((w) => w.dir);

describe.concurrent('type-check', () => {
  it('finds the workspaces', () => {
    expect(workspaces).toEqual(expect.arrayContaining(['apps/api', 'apps/shop', 'apps/staff', 'packages/production', 'packages/schemas', 'seeds', 'tests']));
  });

  it.each(workspaces)('%s', async (dir) => {
    expect(fs.existsSync(path.join(root, dir, 'tsconfig.json')), `${dir} has no tsconfig.json`).toBe(true);
    const result = await typecheckWorkspace(dir);
    expect(result.ok, `type errors in ${dir}:\n${result.output}`).toBe(true);
  });
});
