import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const webBoundaries = [
  { regex: '^@tressury/(schema|fixtures|api)', message: 'The web app never imports the API or the database schema.' },
  { regex: '(^|/)(apps/api|drizzle)/', message: 'The web app never imports the API or the database schema.' },
];

// card-processor and mail are infrastructure (like database and events): any feature may call them.
const featureFolders = ['auth', 'authz', 'branches', 'organisation', 'health', 'seed', 'catalogue', 'staff', 'clients', 'tickets', 'day-close', 'payroll', 'compare'];

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', 'apps/web/src/lib/api-schema.d.ts', 'drizzle/migrations/**', 'tests/output/**', 'data/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false }],
      'no-console': ['error', { allow: ['warn', 'error'] }],
    },
  },
  {
    // Tests feed deliberately malformed input to the validators.
    files: ['**/*.spec.ts', '**/*.e2e-spec.ts', '**/*.test.ts', '**/*.test.tsx'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    // NestJS injects by the runtime class: a constructor parameter must stay a value import.
    files: ['apps/api/src/**/*.ts'],
    rules: { '@typescript-eslint/consistent-type-imports': 'off' },
  },
  {
    // CONVENTIONS.md: libs/domain imports nothing but big.js (tests may use reference libraries).
    files: ['libs/domain/src/**/*.ts'],
    ignores: ['libs/domain/src/**/*.spec.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ regex: '^(?!big\\.js$|\\.)', message: 'libs/domain imports nothing but big.js.' }] }],
      'no-restricted-globals': ['error', { name: 'Date', message: 'No clock in libs/domain: dates come in as ISO strings.' }],
      'no-restricted-properties': ['error', { object: 'Math', property: 'random', message: 'No randomness in libs/domain.' }],
    },
  },
  {
    files: ['apps/web/src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': ['error', { patterns: webBoundaries }],
    },
  },
  {
    files: ['apps/web/src/features/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [...webBoundaries, { regex: '(^|/)(features|app)/', message: 'Features do not import sibling features or app/; compose them in app/.' }] },
      ],
    },
  },
  ...featureFolders.map((feature) => ({
    files: [`apps/api/src/${feature}/**/*.ts`],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: featureFolders
            .filter((other) => other !== feature && !(feature === 'authz' || other === 'authz' || other === 'auth'))
            .map((other) => ({ regex: `^\\.\\./(\\.\\./)?${other}/`, message: 'API features talk through events, not imports.' })),
        },
      ],
    },
  })),
  {
    // Infrastructure serves every feature and depends on none of them.
    files: ['apps/api/src/card-processor/**/*.ts', 'apps/api/src/mail/**/*.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: featureFolders
            .filter((feature) => feature !== 'auth' && feature !== 'authz')
            .map((feature) => ({ regex: `^\\.\\./(\\.\\./)?${feature}/`, message: 'Infrastructure does not import features.' })),
        },
      ],
    },
  },
);
