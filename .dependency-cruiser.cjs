// Import boundaries and cycles, checked by `npm run lint` (dependency-cruiser).
//
// TypeScript 7 ships no JavaScript compiler API, so dependency-cruiser cannot use `typescript` to read our
// files; Babel strips the types (`.dependency-cruiser.babel.json`) and acorn reads what is left. @swc/core is
// installed only because dependency-cruiser scans .ts/.tsx files when a TypeScript-capable parser is present.
// Babel drops `import type` lines, so these rules see the imports that run; type-only imports across a
// boundary are caught by Biome's noRestrictedImports (biome.json).

/** Server modules, lowest first: a module may import the modules before it, never one after it. */
const MODULE_ORDER = [
  // infrastructure used by every module; they import no other module
  { name: 'activity', path: '^server/modules/activity/' },
  { name: 'mail', path: '^server/modules/mail/' },
  { name: 'auth', path: '^server/modules/auth/' },
  { name: 'users', path: '^server/modules/users/' },
  { name: 'catalogue', path: '^server/modules/catalogue/' },
  // the selection engine's server side (today a file of the panels module)
  { name: 'selection', path: '^server/modules/(selection/|panels/selection\\.ts$)' },
  { name: 'jobs', path: '^server/modules/jobs/' },
  { name: 'panels', path: '^server/modules/panels/(?!selection\\.ts$|review\\.ts$)' },
  { name: 'bom', path: '^server/modules/bom/' },
  { name: 'checks', path: '^server/modules/checks/' },
  // review and sign-off (today a file of the panels module)
  { name: 'review', path: '^server/modules/(review|sign-off)/|^server/modules/panels/review\\.ts$' },
  { name: 'submittal', path: '^server/modules/submittal/' },
  // backup and restore reads every table: it stands above all
  { name: 'backup', path: '^server/modules/backup/' },
];

/**
 * Imports against MODULE_ORDER that exist today: to be removed when the module order is restored.
 * Each entry allows exactly one file to import exactly one file; any other import against the order fails.
 */
const KNOWN_ORDER_EXCEPTIONS = [
  // auth signs a user in through the users module
  { from: 'server/modules/auth/passport.ts', to: 'server/modules/users/repository.ts' },
  { from: 'server/modules/auth/router.ts', to: 'server/modules/users/service.ts' },
  // jobs <-> panels
  { from: 'server/modules/jobs/service.ts', to: 'server/modules/panels/service.ts' },
  // panels -> checks -> panels
  { from: 'server/modules/panels/motor-list.ts', to: 'server/modules/checks/service.ts' },
  { from: 'server/modules/panels/change-report-export.ts', to: 'server/modules/checks/service.ts' },
  { from: 'server/modules/panels/change-report-export.ts', to: 'server/modules/panels/review.ts' },
  { from: 'server/modules/panels/router.ts', to: 'server/modules/panels/review.ts' },
  // checks -> submittal -> checks (routers importing routers)
  { from: 'server/modules/checks/router.ts', to: 'server/modules/submittal/router.ts' },
];

/** Runtime import cycles that exist today: to be removed when the module order is restored. */
const KNOWN_CYCLE_FILES = ['server/modules/jobs/service.ts', 'server/modules/panels/service.ts'];

const exactly = (file) => `^${file.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}$`;

function moduleOrderRules() {
  return MODULE_ORDER.slice(0, -1).flatMap((layer, index) => {
    const above = MODULE_ORDER.slice(index + 1).map((l) => `(${l.path})`);
    const exceptions = KNOWN_ORDER_EXCEPTIONS.filter((e) => new RegExp(layer.path).test(e.from));
    const rule = {
      name: `module-order-${layer.name}`,
      comment: `server/modules/${layer.name} may not import a module later in the order (${MODULE_ORDER.slice(index + 1)
        .map((l) => l.name)
        .join(', ')})`,
      severity: 'error',
      from: { path: layer.path, pathNot: exceptions.length ? exceptions.map((e) => exactly(e.from)) : undefined },
      to: { path: above },
    };
    // a file with a known exception still may not import anything else above its layer
    const perFile = [...new Set(exceptions.map((e) => e.from))].map((from) => ({
      name: `module-order-${layer.name}`,
      comment: `${rule.comment}; known exceptions: to be removed when the module order is restored`,
      severity: 'error',
      from: { path: exactly(from) },
      to: { path: above, pathNot: exceptions.filter((e) => e.from === from).map((e) => exactly(e.to)) },
    }));
    return [rule, ...perFile];
  });
}

/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: 'no-circular',
      comment: 'No import cycles. Known exceptions (KNOWN_CYCLE_FILES): to be removed when the module order is restored.',
      severity: 'error',
      from: { pathNot: KNOWN_CYCLE_FILES.map(exactly) },
      to: { circular: true },
    },
    {
      name: 'shared-stands-alone',
      comment: 'shared/ runs in the browser and on the server: it imports neither server/ nor src/, nor Node built-ins',
      severity: 'error',
      from: { path: '^shared/' },
      to: { path: ['^server/', '^src/', '^scripts/', '^tests/'] },
    },
    {
      name: 'shared-no-node',
      comment: 'shared/ runs in the browser too: no Node built-ins',
      severity: 'error',
      from: { path: '^shared/' },
      to: { dependencyTypes: ['core'] },
    },
    {
      name: 'client-not-server',
      comment: 'the client (src/) talks to the server over HTTP only',
      severity: 'error',
      from: { path: '^src/' },
      to: { path: '^server/' },
    },
    {
      name: 'server-not-client',
      comment: 'the server does not import the client',
      severity: 'error',
      from: { path: '^server/' },
      to: { path: '^src/' },
    },
    {
      name: 'feature-not-feature',
      comment: 'a feature in src/features does not import another feature; route files in src/app/routes compose them',
      severity: 'error',
      from: { path: '^src/features/([^/]+)/' },
      to: { path: '^src/features/', pathNot: '^src/features/$1/' },
    },
    {
      name: 'features-not-routes',
      comment: 'features do not import route files (routes import features)',
      severity: 'error',
      from: { path: '^src/(features|components|lib)/' },
      to: { path: '^src/app/' },
    },
    ...moduleOrderRules(),
    {
      name: 'not-to-unresolvable',
      comment: 'an import that does not resolve is a typo or a missing package',
      severity: 'error',
      from: {},
      to: { couldNotResolve: true },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    exclude: { path: '(^|/)node_modules/' },
    tsConfig: { fileName: 'tsconfig.json' },
    babelConfig: { fileName: '.dependency-cruiser.babel.json' },
    enhancedResolveOptions: { exportsFields: ['exports'], conditionNames: ['import', 'require', 'node', 'default', 'types'] },
    cache: { folder: 'node_modules/.cache/dependency-cruiser', strategy: 'content' },
  },
};
