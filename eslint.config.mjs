// @ts-check
// `npm run lint` (eslint . --max-warnings=0): typescript-eslint's type-aware recommended rules
// everywhere, angular-eslint for the apps (components, templates, accessibility), and the two house
// rules the compiler cannot see. Type-aware linting reads the same tsconfigs as `npm run typecheck`.
import eslint from '@eslint/js';
import angular from 'angular-eslint';
import { defineConfig } from 'eslint/config';
import tseslint from 'typescript-eslint';

/** Every TypeScript file belongs to one of these (the root configs too: see packages/db and e2e). */
const TSCONFIGS = [
  'server/tsconfig.json',
  'packages/contracts/tsconfig.json',
  'packages/db/tsconfig.json',
  'packages/domain/tsconfig.json',
  'packages/stripe-fake/tsconfig.json',
  'ops/bench/domain/tsconfig.json',
  'e2e/tsconfig.json',
  'projects/admin/tsconfig.app.json',
  'projects/admin/tsconfig.spec.json',
  'projects/portal/tsconfig.app.json',
  'projects/portal/tsconfig.spec.json',
];

/** The apps reach the contract only through its zod-free entries; the server's packages stay out. */
const BROWSER_IMPORTS = {
  paths: [
    {
      name: '@layerbook/contracts',
      message: "Import from '@layerbook/contracts/types' or '@layerbook/contracts/engine': the root pulls zod into the browser.",
    },
    { name: 'zod', message: 'Validation with zod belongs to the server and packages/contracts.' },
    { name: '@layerbook/db', message: 'The database package is server-only.' },
    { name: 'pg', message: 'PostgreSQL is server-only.' },
  ],
  patterns: [
    {
      group: ['@layerbook/contracts/src/*', 'zod/*', '@layerbook/db/*', 'pg/*'],
      message: "Apps import '@layerbook/contracts/types' and '@layerbook/contracts/engine' only.",
    },
  ],
};

export default defineConfig(
  {
    ignores: [
      '**/dist/',
      '**/node_modules/',
      '.angular/',
      '.data/',
      'out-tsc/',
      'coverage/',
      'migrations/',
      'e2e/.artifacts/',
      'playwright-report/',
      'test-results/',
    ],
  },
  {
    files: ['**/*.ts'],
    extends: [eslint.configs.recommended, tseslint.configs.recommendedTypeChecked],
    languageOptions: {
      parserOptions: { project: TSCONFIGS, tsconfigRootDir: import.meta.dirname },
    },
    rules: {
      // Static methods such as Angular's `Validators.required` are passed around by design.
      '@typescript-eslint/unbound-method': ['error', { ignoreStatic: true }],
      // `_unused` says "deliberately ignored" (Express's four-argument error handler, tuple holes).
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_' }],
    },
  },
  {
    // Test bodies are `any` by design (supertest's `res.body`); the assertions check their shape.
    files: ['**/*.spec.ts'],
    rules: {
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
    },
  },
  {
    files: ['projects/**/*.ts'],
    extends: [angular.configs.tsRecommended],
    processor: angular.processInlineTemplates,
    rules: {
      '@angular-eslint/component-selector': ['error', { type: 'element', prefix: 'lb', style: 'kebab-case' }],
      '@angular-eslint/directive-selector': ['error', { type: 'attribute', prefix: 'lb', style: 'camelCase' }],
      'no-restricted-imports': ['error', BROWSER_IMPORTS],
    },
  },
  {
    files: ['projects/**/*.html'],
    extends: [angular.configs.templateRecommended, angular.configs.templateAccessibility],
  },
  {
    // Services read the clock through ctx.now() (or a `now` passed in), so tests can move time.
    files: ['server/src/**/*.ts'],
    ignores: ['server/src/main.ts', 'server/src/seed/**', 'server/src/testing/**', '**/*.spec.ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector: "NewExpression[callee.name='Date'][arguments.length=0]",
          message: 'Read the clock through ctx.now() (or a `now: Date` passed in), not new Date().',
        },
      ],
    },
  },
  {
    files: ['**/*.{js,cjs,mjs}'],
    extends: [eslint.configs.recommended, tseslint.configs.disableTypeChecked],
    languageOptions: {
      globals: {
        module: 'writable',
        require: 'readonly',
        __dirname: 'readonly',
        process: 'readonly',
      },
    },
  },
);
