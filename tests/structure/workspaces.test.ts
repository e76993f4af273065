// The workspace manifests: every `exports` target exists, the workspaces
// depend on each other without a cycle, and the pure packages reach for no
// global I/O (which an import rule cannot see).
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { listWorkspaces } from '../../scripts/lib/workspaces.mjs';

const root = path.resolve(import.meta.dirname, '../..');
const workspaces = listWorkspaces();
const byName = new Map(workspaces.map((w) => [w.manifest.name as string, w]));

/**
 * Dependencies between workspaces that only test code uses and that point
 * back up the graph. The seeds write the demo scenario through the API's
 * models (seeds → api), and the API's own tests load that scenario; the
 * import rule `seeds-only-from-tests` keeps it out of the API's source.
 */
const testOnlyBackEdges = [{ from: '@fryline/api', to: '@fryline/seeds' }];

function exportTargets(exports: unknown): string[] {
  if (typeof exports === 'string') return [exports];
  if (exports && typeof exports === 'object') return Object.values(exports).flatMap(exportTargets);
  return [];
}

describe('workspace manifests', () => {
  it.each(workspaces.map((w) => w.dir))('%s: every export points at a file', (dir) => {
    const { manifest } = workspaces.find((w) => w.dir === dir)!;
    const missing = exportTargets(manifest.exports).filter((target) => {
      if (!target.includes('*')) return !fs.existsSync(path.join(root, dir, target));
      // a pattern export ("./services/*": "./src/services/*.ts") needs its folder
      return !fs.existsSync(path.join(root, dir, path.dirname(target)));
    });
    expect(missing, `${dir}/package.json exports files that do not exist`).toEqual([]);
  });

  it('workspaces depend on each other without a cycle (test-only back edges aside)', () => {
    const edges = new Map<string, string[]>();
    for (const w of workspaces) {
      const m = w.manifest;
      const deps = { ...m.dependencies, ...m.peerDependencies, ...m.devDependencies } as Record<string, string>;
      const isBackEdge = (to: string) => testOnlyBackEdges.some((e) => e.from === m.name && e.to === to) && !(to in (m.dependencies ?? {}));
      edges.set(m.name, Object.keys(deps).filter((d) => byName.has(d) && !isBackEdge(d)));
    }
    const cycles: string[] = [];
    const state = new Map<string, 'open' | 'done'>();
    const visit = (name: string, trail: string[]) => {
      if (state.get(name) === 'done') return;
      if (state.get(name) === 'open') {
        cycles.push([...trail.slice(trail.indexOf(name)), name].join(' → '));
        return;
      }
      state.set(name, 'open');
      for (const next of edges.get(name) ?? []) visit(next, [...trail, name]);
      state.set(name, 'done');
    };
    for (const name of edges.keys()) visit(name, []);
    expect(cycles).toEqual([]);
  });

  it('the allowed test-only back edges are still devDependencies', () => {
    for (const e of testOnlyBackEdges) {
      const m = byName.get(e.from)!.manifest;
      expect(m.dependencies?.[e.to], `${e.from} must not depend on ${e.to} outside its tests`).toBeUndefined();
    }
  });
});

describe('pure packages use no global I/O', () => {
  // fetch, XMLHttpRequest, WebSocket and friends need no import, so the import rules can't see them
  const globalIo = /\b(fetch|XMLHttpRequest|WebSocket|EventSource|sendBeacon|indexedDB|localStorage|sessionStorage)\s*[(.]|\bnew\s+(XMLHttpRequest|WebSocket|EventSource)\b/;

  it.each(['packages/production/src', 'packages/schemas/src'])('%s', (dir) => {
    const files = fs
      .readdirSync(path.join(root, dir), { recursive: true, encoding: 'utf8' })
      .filter((f) => /\.tsx?$/.test(f) && !/\.test\.tsx?$/.test(f));
    expect(files.length, `no source files in ${dir}`).toBeGreaterThan(0);
    const hits = files.flatMap((f) =>
      fs
        .readFileSync(path.join(root, dir, f), 'utf8')
        .split('\n')
        .map((line, i) => ({ line: line.replace(/\/\/.*$/, ''), n: i + 1 }))
        .filter(({ line }) => globalIo.test(line))
        .map(({ line, n }) => `${dir}/${f}:${n}: ${line.trim()}`),
    );
    expect(hits).toEqual([]);
  });
});
