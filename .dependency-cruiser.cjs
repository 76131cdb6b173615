/**
 * The allowed arrows between Upwell's zones (DEVELOPERS.md, "Boundaries"). `scripts/boundaries.test.ts` cruises the
 * repository with this file inside `npm test`, so a forbidden import fails the run naming the file and the rule.
 * Also usable by hand: `npx depcruise common server web e2e scripts --config .dependency-cruiser.cjs`.
 *
 * The zones are folders, not packages: the engine, the contracts and the figure kinds all live in common/src.
 */
const ENGINE = ['^common/src/(series|stats|events|units|grid|time|maps|regions)/', '^common/src/engine\\.ts$'];
const CONTRACTS = ['^common/src/(api|editor|collab)/', '^common/src/roles\\.ts$'];
// common/src/figures is being renamed common/src/figure-kinds (issue 13 item 1); both names are the same zone.
const FIGURE_KINDS = ['^common/src/(figures|figure-kinds)/'];
const FIXTURES = ['^common/test-fixtures/'];
const OURS = ['^(common|server|web|e2e|scripts)/'];
const TEST_FILES = ['\\.(test|spec)\\.tsx?$'];
// Test code: test files, and the helpers beside the server's end-to-end tests and the browser tests.
const TEST_CODE = [...TEST_FILES, '^server/test/', '^e2e/'];
const NPM = ['npm', 'npm-dev', 'npm-optional', 'npm-peer', 'npm-bundled', 'npm-no-pkg', 'npm-unknown'];

/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: 'engine-imports-only-engine',
      comment: 'The engine (series, stats, events, units, grid, time) is pure: it imports nothing of ours but itself.',
      severity: 'error',
      from: { path: ENGINE },
      to: { path: OURS, pathNot: [...ENGINE, ...FIXTURES] },
    },
    {
      name: 'engine-has-no-dependencies',
      comment: 'The engine runs in Node and in the browser with no runtime dependency (its tests may use reference libraries).',
      severity: 'error',
      from: { path: ENGINE, pathNot: TEST_FILES },
      to: { dependencyTypes: [...NPM, 'core'] },
    },
    {
      name: 'contracts-import-only-engine',
      comment:
        'Contracts (api, editor, collab, roles) are schemas and constants; they may lean on the engine, nothing else — except ' +
        'the figure and snapshot route bodies, which carry the figure kinds\' recipe and result schemas.',
      severity: 'error',
      from: { path: CONTRACTS },
      to: { path: OURS, pathNot: [...CONTRACTS, ...ENGINE, ...FIGURE_KINDS, ...FIXTURES] },
    },
    {
      name: 'only-figure-routes-import-figure-kinds',
      comment: 'Of the contracts, only the figure and snapshot route bodies may use the figure kinds.',
      severity: 'error',
      from: { path: CONTRACTS, pathNot: ['^common/src/api/(figures|snapshots|notebook-file)\\.ts$'] },
      to: { path: FIGURE_KINDS },
    },
    {
      name: 'figure-kinds-import-only-contracts-and-engine',
      comment: 'A figure kind is built from the contracts and the engine; it never reaches into the server or the web.',
      severity: 'error',
      from: { path: FIGURE_KINDS },
      to: { path: OURS, pathNot: [...FIGURE_KINDS, ...CONTRACTS, ...ENGINE, ...FIXTURES] },
    },
    {
      name: 'common-never-imports-apps',
      comment: 'common/ is imported by server and web, never the other way round.',
      severity: 'error',
      from: { path: '^common/' },
      to: { path: '^(server|web|e2e|scripts)/' },
    },
    {
      name: 'server-never-imports-web',
      severity: 'error',
      from: { path: '^server/' },
      to: { path: '^(web|e2e)/' },
    },
    {
      name: 'web-never-imports-server',
      comment: 'The web reaches the server only over HTTP and the socket; shared shapes come from @upwell/common.',
      severity: 'error',
      from: { path: '^web/' },
      to: { path: '^(server|e2e)/' },
    },
    {
      name: 'demo-generator-stands-alone',
      comment: 'The demo generator (its own package) uses only @upwell/common; the server uses it, never the other way round.',
      severity: 'error',
      from: { path: '^server/demo-generator/' },
      to: { path: OURS, pathNot: ['^server/demo-generator/', '^common/src/index\\.ts$'] },
    },
    {
      name: 'apps-use-the-common-entry',
      comment: 'Server, web and browser tests import `@upwell/common` (common/src/index.ts), never a file behind it.',
      severity: 'error',
      from: { path: '^(server|web|e2e)/' },
      to: { path: '^common/', pathNot: ['^common/src/index\\.ts$', ...FIXTURES] },
    },
    {
      name: 'fixtures-only-in-tests',
      comment: 'Reference data is for tests; product code never reads it.',
      severity: 'error',
      from: { path: OURS, pathNot: [...TEST_CODE, ...FIXTURES] },
      to: { path: FIXTURES },
    },
    {
      name: 'imports-resolve',
      comment: 'An import of ours that does not resolve would slip past every rule above.',
      severity: 'error',
      from: { path: OURS },
      to: { couldNotResolve: true },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    exclude: { path: '(^|/)(node_modules|dist|dist-bench|test-artifacts)/' },
    // Type-only imports count: a type of the server in the web is as much a wrong arrow as a value.
    tsPreCompilationDeps: true,
    // Maps `@upwell/common` to common/src/index.ts, as the web's tsconfig and the vitest alias do.
    tsConfig: { fileName: 'tsconfig.boundaries.json' },
    // Keep reading files with `exports`-only packages (vega-lite) resolvable.
    enhancedResolveOptions: { exportsFields: ['exports'], conditionNames: ['import', 'require', 'node', 'types', 'default'], extensions: ['.ts', '.tsx', '.d.ts', '.js', '.mjs', '.cjs', '.json'] },
  },
};
