// `npm run typecheck`: every workspace type-checked with its own
// tsconfig.json (scripts/lib/typecheck-workspace.mjs), a few at a time.
// Prints each error with its file; exits 1 if any workspace has one.
// `npm test` runs the same check (tests/structure/typecheck.test.ts).
import fs from 'node:fs';
import path from 'node:path';
import { ensurePnpm, installDependencies, log, root, SetupError } from './lib/shell.mjs';
import { typecheckAll } from './lib/workspaces.mjs';

try {
  if (!fs.existsSync(path.join(root, 'node_modules/typescript/bin/tsc'))) installDependencies(ensurePnpm());
} catch (err) {
  console.error(err instanceof SetupError ? err.message : err);
  process.exit(1);
}
const started = Date.now();
const results = await typecheckAll({
  onResult: (r) => log(`${r.ok ? 'ok    ' : 'FAILED'} ${r.dir} (${(r.ms / 1000).toFixed(1)} s)`),
});
const failed = results.filter((r) => !r.ok);
for (const r of failed) console.error(`\n${r.dir}:\n${r.output}`);
log(`${results.length - failed.length} of ${results.length} workspaces type-check (${((Date.now() - started) / 1000).toFixed(1)} s)`);
process.exit(failed.length ? 1 : 0);
