// ESLint flat config. The layer rules (DEVELOPERS.md, "Lint, format, unused code") live here (boundaries/dependencies,
// no-restricted-globals, no-restricted-imports, no-restricted-syntax); tests/unit/lint-boundaries.test.ts
// proves each one fires.
import js from '@eslint/js';
import boundaries from 'eslint-plugin-boundaries';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const testFiles = ['**/*.test.ts', '**/*.test.tsx', 'tests/**', '**/test-support/**'];

/** The layers, matched on the path from the repository root; a file belongs to its innermost element. */
const elements = [
  { type: 'engine', pattern: 'shared/uncertainty', partialMatch: false },
  { type: 'contracts', pattern: 'shared/contracts', partialMatch: false },
  { type: 'domain', pattern: 'shared/domain', partialMatch: false },
  { type: 'server', pattern: 'server', partialMatch: false },
  { type: 'tooling', pattern: '{bench,migrations,tests}', partialMatch: false },
  { type: 'client-app', pattern: 'src/app', partialMatch: false },
  { type: 'feature', pattern: 'src/features/*', partialMatch: false, capture: ['feature'] },
  { type: 'client-base', pattern: 'src/{components,config,hooks,lib,test-support}', partialMatch: false },
];

const clientTypes = ['client-app', 'feature', 'client-base'];

/** Host modules (Node built-ins, frameworks) kept out of shared code; its tests may read fixtures from disk. */
const hostPolicies = [
  {
    // Shared code runs unchanged in the browser (the engine also in a Web Worker) and in Node.
    from: { element: { type: ['engine', 'contracts', 'domain'] } },
    disallow: { to: [{ module: { origin: 'core' } }, { module: { origin: 'external', source: '!zod' } }] },
    message: 'shared/ imports only its own files and zod: no Node module, DOM library or framework.',
  },
];

/** What each layer may not reach. Anything not named here is allowed. */
const layerPolicies = [
  {
    from: { element: { type: 'engine' } },
    disallow: { to: { element: { type: ['contracts', 'domain', 'server', 'tooling', ...clientTypes] } } },
    message: 'The engine (shared/uncertainty) imports only its own files and zod.',
  },
  {
    from: { element: { type: 'contracts' } },
    disallow: { to: { element: { type: ['domain', 'server', 'tooling', ...clientTypes] } } },
    message: 'shared/contracts holds shapes and words: it imports neither the rules of shared/domain, src nor server.',
  },
  {
    from: { element: { type: 'domain' } },
    disallow: { to: { element: { type: ['server', 'tooling', ...clientTypes] } } },
    message: 'shared/ imports neither src nor server (nor bench, migrations or tests).',
  },
  {
    from: { element: { type: 'server' } },
    disallow: { to: { element: { type: clientTypes } } },
    message: 'The server never imports the client (src).',
  },
  {
    from: { element: { type: clientTypes } },
    disallow: { to: { element: { type: 'server' } } },
    message: 'The client never imports the server.',
  },
  {
    from: { element: { type: 'feature' } },
    disallow: { to: { element: { type: 'feature', captured: { feature: '!{{ from.element.captured.feature }}' } } } },
    message: 'Features do not import other features: move the shared piece to src/components or src/lib.',
  },
  {
    from: { element: { type: ['feature', 'client-base'] } },
    disallow: { to: { element: { type: 'client-app' } } },
    message: 'Only the app layer (src/app, src/main.tsx) imports the app layer.',
  },
  {
    from: { element: { type: 'client-base' } },
    disallow: { to: { element: { type: 'feature' } } },
    message: 'src/components, src/lib and src/config import no feature.',
  },
];

/** Host globals shared code must not touch (the DOM's and Node's). */
const hostGlobals = [
  'window',
  'document',
  'navigator',
  'localStorage',
  'sessionStorage',
  'location',
  'fetch',
  'process',
  'Buffer',
  'require',
  'module',
  '__dirname',
  '__filename',
  'global',
  'setImmediate',
].map((name) => ({ name, message: 'Shared code runs in the browser and Node alike: pass what it needs in.' }));

/** Server layers (routers → services → repositories → Knex); services read the time from the injected clock. */
const serverProduction = { files: ['server/**/*.ts'], ignores: [...testFiles, 'server/lib/clock.ts'] };
const noSystemTime = {
  selector: "NewExpression[callee.name='Date'][arguments.length=0]",
  message: 'Read the time from the injected clock (server/lib/clock.ts), never new Date().',
};
const noDateInService = {
  selector: "NewExpression[callee.name='Date']",
  message: 'Services read the time from the injected clock (`now`), never new Date().',
};
const noInlineRoles = {
  selector:
    "CallExpression[callee.property.name='lab']:matches([callee.object.name='authorize'], [callee.object.property.name='authorize']) > ArrayExpression",
  message: 'Name a permission of shared/contracts/permissions.ts, never an inline list of roles.',
};
const noSqlInService = [
  { selector: 'CallExpression[callee.name=/^(db|trx)$/]', message: 'Queries live in repositories.' },
  { selector: "MemberExpression[object.name='db']", message: 'Queries live in repositories.' },
  { selector: "CallExpression[callee.property.name='raw']", message: 'Queries live in repositories.' },
];

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'tests/fixtures/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      eqeqeq: ['error', 'always', { null: 'ignore' }],
      // Declaration merging (express's Request and User) needs `declare global { namespace Express }`.
      '@typescript-eslint/no-namespace': ['error', { allowDeclarations: true }],
      '@typescript-eslint/no-empty-object-type': ['error', { allowInterfaces: 'with-single-extends' }],
    },
  },
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    plugins: { boundaries },
    settings: {
      'boundaries/elements': elements,
      'boundaries/dependency-nodes': ['import', 'export', 'dynamic-import', 'require'],
      'import/resolver': { node: { extensions: ['.ts', '.tsx', '.js', '.mjs', '.json'] } },
    },
    rules: {
      'boundaries/dependencies': [
        'error',
        { default: 'allow', checkAllOrigins: true, policies: [...hostPolicies, ...layerPolicies] },
      ],
    },
  },
  {
    // Tests of shared code may read fixtures from disk and use Node's crypto; the layer rules still bind them.
    files: ['shared/**/*.test.ts'],
    rules: {
      'boundaries/dependencies': ['error', { default: 'allow', checkAllOrigins: true, policies: layerPolicies }],
    },
  },
  {
    files: ['shared/**/*.ts'],
    ignores: ['**/*.test.ts'],
    rules: { 'no-restricted-globals': ['error', ...hostGlobals] },
  },
  { ...serverProduction, rules: { 'no-restricted-syntax': ['error', noSystemTime] } },
  {
    ...serverProduction,
    files: ['server/**/*-router.ts'],
    rules: {
      'no-restricted-syntax': ['error', noSystemTime, noInlineRoles],
      'no-restricted-imports': [
        'error',
        {
          paths: [{ name: 'knex', message: 'Routers reach the database only through services.' }],
          patterns: [
            { regex: '(^|/)db/connection$', message: 'Routers reach the database only through services.' },
            { regex: '-repository$', message: 'Routers reach the database only through services.' },
          ],
        },
      ],
    },
  },
  {
    ...serverProduction,
    files: ['server/**/*-service.ts'],
    rules: {
      'no-restricted-syntax': ['error', noDateInService, ...noSqlInService],
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          paths: [{ name: 'knex', message: 'Transactions come through Transact.', allowTypeImports: true }],
          patterns: [
            {
              regex: '(^|/)db/connection$',
              message: 'Services get the database through repositories and Transact.',
              allowTypeImports: true,
            },
          ],
        },
      ],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    ignores: testFiles,
    languageOptions: { globals: { ...globals.browser } },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.flat.recommended.rules,
      'react-hooks/exhaustive-deps': 'error',
      // Off: it flags the latest-value ref (`ref.current = value` in render, read by a timer or worker callback)
      // and react-hook-form's callback `field.ref`, both correct here; it found no real bug in this tree.
      'react-hooks/refs': 'off',
    },
  },
);
