// Type-checks one workspace with its own tsconfig.json and reports only the
// errors in that workspace's files:
//   node scripts/lib/typecheck-workspace.mjs <workspace-folder>
// Why not plain `tsc --noEmit -p`: the workspaces import each other as
// TypeScript source, so tsc would check the API's files again under the
// seeds', the tests' and the other apps' settings (three times the work, and
// under the wrong settings). Here the other workspaces' files are read for
// their types only; each file is checked once, by its own workspace.
// Also an error: a TypeScript file in the workspace that its tsconfig leaves out.
// Exit code 1 when there are errors, each printed as `file(line,col): error TSxxxx: …`.
import fs from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

const root = path.resolve(import.meta.dirname, '../..');
const dir = path.resolve(root, process.argv[2] ?? '.');
const configFile = path.join(dir, 'tsconfig.json');

const host = { ...ts.sys, onUnRecoverableConfigFileDiagnostic: (d) => report([d]) };
const parsed = ts.getParsedCommandLineOfConfigFile(configFile, { noEmit: true }, host);
if (!parsed) process.exit(1);

const program = ts.createProgram({ rootNames: parsed.fileNames, options: parsed.options, projectReferences: parsed.projectReferences });
const own = (file) => file.fileName.startsWith(`${dir}/`) && !file.fileName.includes('/node_modules/');
const diagnostics = [
  ...parsed.errors,
  ...program.getOptionsDiagnostics(),
  ...program.getGlobalDiagnostics(),
  ...program.getSourceFiles().filter(own).flatMap((file) => [...program.getSyntacticDiagnostics(file), ...program.getSemanticDiagnostics(file)]),
];
report(diagnostics);

// a TypeScript file the tsconfig leaves out would never be checked by anyone
const covered = new Set(parsed.fileNames.map((f) => path.resolve(f)));
const uncovered = typescriptFiles(dir).filter((f) => !covered.has(f));
for (const f of uncovered) {
  process.stdout.write(`${path.relative(root, f)}: error: not in ${path.relative(root, configFile)} "include", so never type-checked\n`);
}
process.exit(uncovered.length || diagnostics.some((d) => d.category === ts.DiagnosticCategory.Error) ? 1 : 0);

function typescriptFiles(folder) {
  return fs.readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) return entry.name === 'node_modules' || entry.name === 'dist' || entry.name.startsWith('.') ? [] : typescriptFiles(full);
    return /\.(ts|tsx|mts|cts)$/.test(entry.name) ? [full] : [];
  });
}

function report(list) {
  if (!list.length) return;
  process.stdout.write(
    ts.formatDiagnostics(list, { getCanonicalFileName: (f) => f, getCurrentDirectory: () => root, getNewLine: () => '\n' }),
  );
}
