// Lint: the framework's rules, TypeScript's, and the import arrows of docs/architecture.md.
import boundaries from 'eslint-plugin-boundaries';
import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';

// Where each file sits in the layers. First match wins, so narrow patterns come first.
const layer = (type, pattern, capture) => ({
  type,
  pattern,
  partialMatch: false,
  ...(capture ? { capture } : {}),
});
const elements = [
  layer('engine', 'lib/engine/**'),
  layer('validation', 'lib/validation/**'),
  layer('service', 'lib/server/**'),
  layer('rules', 'lib/**'),
  layer('queries', 'db/queries/**'),
  layer('seed', 'db/seed/**'),
  layer('schema', 'db/**'),
  layer('ui', 'app/_components/**'),
  layer('shell', 'app/\\(app\\)/_components/**'),
  layer('feature', 'app/\\(app\\)/*/**', ['feature']),
  layer('app', 'app/\\(app\\)'),
  layer('feature', 'app/api/*/**', ['feature']),
  layer('feature', 'app/\\(*\\)/**', ['feature']),
  layer('feature', 'app/*/**', ['feature']),
  layer('app', 'app/**'),
];

const pure = ['engine', 'validation', 'rules'];
const may = (from, to) => ({
  from: { element: { type: from } },
  allow: { to: { element: { types: { anyOf: to } } } },
});
const policies = [
  may('engine', ['engine']),
  may('validation', ['engine', 'validation', 'rules']),
  may('rules', ['engine', 'validation', 'rules']),
  may('schema', [...pure, 'schema']),
  may('queries', [...pure, 'schema', 'queries']),
  may('service', [...pure, 'schema', 'queries', 'service']),
  may('seed', [...pure, 'schema', 'queries', 'service', 'seed']),
  may('ui', [...pure, 'queries', 'service', 'ui']),
  may('shell', [...pure, 'queries', 'service', 'ui', 'shell']),
  may('app', [...pure, 'queries', 'service', 'ui', 'shell', 'app']),
  // a feature uses shared UI and its own files, never another feature's
  may('feature', [...pure, 'queries', 'service', 'ui']),
  {
    from: { element: { type: 'feature' } },
    allow: {
      to: { element: { type: 'feature', captured: { feature: '{{ from.element.captured.feature }}' } } },
    },
  },
];

const config = [
  ...nextVitals,
  ...nextTs,
  {
    ignores: ['.next/**', '.data/**', 'node_modules/**', 'next-env.d.ts', 'db/migrations/**', 'public/sw.js'],
  },
  {
    files: ['app/**', 'lib/**', 'db/**'],
    plugins: { boundaries },
    settings: {
      'boundaries/elements': elements,
      'boundaries/include': ['app/**', 'lib/**', 'db/**'],
      'import/resolver': { typescript: { alwaysTryTypes: true } },
    },
    rules: {
      'boundaries/dependencies': [2, { default: 'disallow', policies }],
    },
  },
  {
    // pure layers: no framework, no database, no clock-reading services
    files: ['lib/**'],
    ignores: ['lib/server/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            { group: ['next', 'next/*'], message: 'lib/ outside lib/server is pure: no framework imports.' },
            {
              group: ['@/db', '@/db/*', 'pg', 'drizzle-orm', 'drizzle-orm/*'],
              message: 'Pure rules take data; services load it.',
            },
          ],
        },
      ],
    },
  },
  {
    // one clock: a time a person reads goes through lib/format/time.ts, in the terminal's zone
    files: ['app/**', 'lib/**', 'db/**'],
    ignores: ['lib/format/time.ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        ...[
          "ImportDeclaration[source.value='date-fns'] > ImportSpecifier[imported.name=/^(format|lightFormat|intlFormat|formatRelative|formatDistance|formatDistanceToNow)$/]",
          "NewExpression[callee.object.name='Intl'][callee.property.name='DateTimeFormat']",
          "CallExpression[callee.object.name='Intl'][callee.property.name='DateTimeFormat']",
          'CallExpression[callee.property.name=/^toLocale(Date|Time)String$/]',
        ].map((selector) => ({
          selector,
          message:
            "Write times through lib/format/time.ts (formatTime, formatStamp): the terminal's zone, one clock.",
        })),
      ],
    },
  },
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
];

export default config;
