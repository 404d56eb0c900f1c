// Import boundaries and cycles, checked by `npm run lint` (dependency-cruiser).
//
// TypeScript 7 ships no JavaScript compiler API, so dependency-cruiser cannot use `typescript` to read our
// files; Babel strips the types (`.dependency-cruiser.babel.json`) and acorn reads what is left. @swc/core is
// installed only because dependency-cruiser scans .ts/.tsx files when a TypeScript-capable parser is present.
// Babel drops `import type` lines, so these rules see the imports that run; type-only imports across a
// boundary are caught by Biome's noRestrictedImports (biome.jsonc), type-only cycles by tests/unit/import-cycles.test.ts.

/**
 * Server modules depend one way, down the layers of server/modules/order.json (lowest first): a module
 * imports only modules of a lower layer, never one of its own layer or above. The same file drives
 * tests/unit/server/module-order.test.ts (which also sees type-only imports).
 */
const { layers } = require('./server/modules/order.json');

function moduleOrderRules() {
  return layers.flatMap((layer, index) =>
    layer.map((name) => {
      const notBelow = layers
        .slice(index)
        .flat()
        .filter((other) => other !== name);
      return {
        name: `module-order-${name}`,
        comment: `server/modules/${name} may import only modules of a lower layer (server/modules/order.json), not ${notBelow.join(', ')}`,
        severity: 'error',
        from: { path: `^server/modules/${name}/` },
        to: { path: `^server/modules/(${notBelow.join('|')})/` },
      };
    }),
  );
}

/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: 'no-circular',
      comment: 'No import cycles.',
      severity: 'error',
      from: {},
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
