// The import rules of .dependency-cruiser.cjs, one test per rule, over every
// workspace (source, tests and scripts of apps, packages, fakes, seeds, tests).
// A failure lists each offending import as "from-file → to-file".
import path from 'node:path';
import { createRequire } from 'node:module';
import { beforeAll, describe, expect, it } from 'vitest';
import { cruise, type ICruiseResult, type IConfiguration } from 'dependency-cruiser';
import extractDepcruiseOptions from 'dependency-cruiser/config-utl/extract-depcruise-options';
import { codeRoots } from '../../scripts/lib/workspaces.mjs';

const root = path.resolve(import.meta.dirname, '../..');
const configFile = path.join(root, '.dependency-cruiser.cjs');
const config = createRequire(import.meta.url)(configFile) as IConfiguration;
const rules = (config.forbidden ?? []).map((r) => r.name!);

let result: ICruiseResult;
beforeAll(async () => {
  const options = await extractDepcruiseOptions(configFile);
  const out = await cruise(codeRoots, { ...options, baseDir: root });
  result = out.output as ICruiseResult;
});

describe('import boundaries (.dependency-cruiser.cjs)', () => {
  it('looks at the code of every workspace', () => {
    const folders = new Set(result.modules.filter((m) => !m.coreModule && !m.source.includes('node_modules/')).map((m) => m.source.split('/').slice(0, 2).join('/')));
    for (const dir of ['apps/api', 'apps/shop', 'apps/staff', 'packages/production', 'packages/schemas', 'seeds/src', 'tests/e2e']) {
      expect([...folders], `no module of ${dir} was cruised`).toContain(dir);
    }
  });

  it.each(rules)('%s', (rule) => {
    const breaks = result.summary.violations
      .filter((v) => v.rule.name === rule)
      .map((v) => (v.cycle ? `${v.from} → ${v.cycle.map((c) => c.name).join(' → ')}` : `${v.from} → ${v.to}`));
    const comment = config.forbidden!.find((r) => r.name === rule)!.comment;
    expect(breaks, `${comment}\n  ${breaks.join('\n  ')}\n`).toEqual([]);
  });
});
