// The boundaries of the code, checked on every `npm test` (tests/structure)
// and by hand with `npm run lint:boundaries`. Each rule names what it keeps
// apart; a break is reported as "rule-name: from-file → to-file".
//
// Paths are relative to the repository root. Workspace packages are resolved
// through their `exports` to the real source files, so an import of
// `@fryline/api/db` from another workspace is seen as `apps/api/src/db/…`.

/** Node built-ins that reach the disk, the network, other processes or the terminal. */
const ioBuiltins = [
  'fs', 'fs/promises', 'net', 'http', 'https', 'http2', 'dgram', 'dns', 'dns/promises', 'tls',
  'child_process', 'cluster', 'worker_threads', 'readline', 'readline/promises', 'inspector', 'repl', 'sqlite',
];
/** npm packages whose job is I/O: databases, HTTP clients and servers, mail, payments, files. */
const ioPackages = [
  'pg', 'pg-pool', 'sequelize', 'umzug', 'mysql2', 'sqlite3', 'better-sqlite3', 'ioredis', 'redis', 'mongodb',
  'express', 'express-session', 'connect-pg-simple', 'supertest',
  'node-fetch', 'undici', 'axios', 'got', 'ky', 'cross-fetch', 'isomorphic-fetch', 'superagent',
  'nodemailer', 'smtp-server', 'mailparser', 'stripe', 'passport', 'passport-google-oauth20',
  'fs-extra', 'graceful-fs', 'glob', 'chokidar', 'ws', 'socket.io', 'playwright-core',
];
const pure = '^packages/(production|schemas)/src/';

/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: 'no-app-imports-app',
      comment: 'An app never imports another app: share through packages/* (contract in @fryline/schemas, screens in @fryline/ui).',
      severity: 'error',
      from: { path: '^apps/([^/]+)/' },
      to: { path: '^apps/([^/]+)/', pathNot: '^apps/$1/' },
    },
    {
      name: 'no-feature-imports-feature',
      comment: 'Within an app, src/features/<x>/ never imports another feature: move what both need to src/app, src/lib or a package.',
      severity: 'error',
      from: { path: '^apps/([^/]+)/src/features/([^/]+)/' },
      to: { path: '^apps/$1/src/features/[^/]+/', pathNot: '^apps/$1/src/features/$2/' },
    },
    {
      name: 'no-io-in-pure-packages',
      comment: 'packages/production and packages/schemas are pure: no file, network, process or database access (Node built-ins).',
      severity: 'error',
      from: { path: pure },
      to: { dependencyTypes: ['core'], path: `^(node:)?(${ioBuiltins.join('|')})$` },
    },
    {
      name: 'no-io-packages-in-pure-packages',
      comment: 'packages/production and packages/schemas are pure: no database, HTTP, mail or payment library.',
      severity: 'error',
      from: { path: pure },
      to: { path: `(^|/)node_modules/(${ioPackages.join('|')})/` },
    },
    {
      name: 'no-package-imports-app',
      comment: 'Packages (production, schemas, ui) sit below the apps and never import one.',
      severity: 'error',
      from: { path: '^packages/' },
      to: { path: '^apps/' },
    },
    {
      name: 'no-service-imports-route',
      comment: 'API services are called by routes, never the other way round: a service never imports from routes/.',
      severity: 'error',
      from: { path: '^apps/api/src/services/' },
      to: { path: '^apps/api/src/routes/' },
    },
    {
      name: 'seeds-only-from-tests',
      comment:
        'The demo scenario writes through the API\'s models, so @fryline/seeds sits above the API. ' +
        'Only test code (tests/, apps/*/test/) and the seeds themselves may import it; app source never does.',
      severity: 'error',
      from: { pathNot: '^(seeds/|tests/|apps/[^/]+/test/)' },
      to: { path: '^seeds/' },
    },
    {
      name: 'no-cycle',
      comment: 'No import cycles anywhere, across workspaces too (type-only imports included).',
      severity: 'error',
      from: {},
      to: { circular: true },
    },
    {
      name: 'no-unresolvable',
      comment: 'Every import resolves to a file (a missing file or a wrong package export fails here before it fails at run time).',
      severity: 'error',
      from: {},
      // Vite plugins' virtual modules (virtual:pwa-register) exist only inside the build
      to: { couldNotResolve: true, pathNot: '^virtual:' },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    exclude: { path: '(^|/)(dist|\\.test-data[^/]*|\\.data)/' },
    // type-only imports count too: an app importing another app's types is still a boundary break
    tsPreCompilationDeps: true,
    enhancedResolveOptions: {
      exportsFields: ['exports'],
      conditionNames: ['import', 'require', 'node', 'default', 'types'],
      mainFields: ['module', 'main', 'types', 'typings'],
      extensions: ['.ts', '.tsx', '.js', '.mjs', '.cjs', '.json', '.d.ts'],
    },
    skipAnalysisNotInRules: true,
    reporterOptions: { text: { highlightFocused: true } },
  },
};
