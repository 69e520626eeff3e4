// @ts-check
import js from '@eslint/js';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

/** Import boundaries: libs import no framework; web and server never import each other. */
const FRAMEWORKS = [
  '@nestjs/*',
  'react',
  'react-dom',
  'react-router-dom',
  '@mui/*',
  '@emotion/*',
  'drizzle-orm',
  'drizzle-orm/*',
];
/**
 * @param {string[]} patterns
 * @param {string} message
 */
const boundary = (patterns, message) => ({
  'no-restricted-imports': ['error', { patterns: [{ group: patterns, message }] }],
});

export default tseslint.config(
  {
    ignores: [
      '**/node_modules/**',
      '**/dist/**',
      'data/**',
      'apps/server/drizzle/**',
      'apps/web/e2e/artifacts/**',
      'test-results/**',
      '.db-check.*/**',
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      globals: { ...globals.node },
      parserOptions: {
        projectService: {
          allowDefaultProject: ['*.js', '*.ts', 'scripts/*.mjs', 'scripts/bench/*.mjs', 'apps/web/e2e/*.mjs'],
          defaultProject: 'tsconfig.base.json',
        },
        tsconfigRootDir: import.meta.dirname,
      },
    },
    plugins: { 'import-x': importX },
    rules: {
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/no-misused-promises': ['error', { checksVoidReturn: { attributes: false } }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': [
        'error',
        { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false },
      ],
      'import-x/no-cycle': ['error', { maxDepth: 10 }],
      'import-x/no-self-import': 'error',
    },
    settings: {
      // NodeNext sources import './x.js' for './x.ts'; the workspace packages point their types at src.
      'import-x/resolver-next': [
        importX.createNodeResolver({
          extensions: ['.ts', '.tsx', '.js', '.mjs'],
          extensionAlias: { '.js': ['.ts', '.tsx', '.js'] },
          conditionNames: ['types', 'import', 'default'],
        }),
      ],
    },
  },
  {
    // Plain-JS tooling scripts carry no types to check against.
    files: ['**/*.mjs'],
    ...tseslint.configs.disableTypeChecked,
  },
  {
    // Nest injects by the runtime value of a constructor's parameter types: a type-only import would inject undefined.
    files: ['apps/server/src/**/*.ts'],
    rules: { '@typescript-eslint/consistent-type-imports': 'off' },
  },
  {
    files: ['libs/**/*.ts'],
    rules: boundary(
      [...FRAMEWORKS, 'better-sqlite3', 'socket.io', 'socket.io-client', 'express', 'node:*', '**/apps/**'],
      'libs/ is pure TypeScript + zod: no frameworks, no I/O, no app code.',
    ),
  },
  {
    files: ['apps/web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      ...boundary(
        ['**/apps/server/**', '@nestjs/*', 'drizzle-orm', 'drizzle-orm/*', 'better-sqlite3', 'socket.io'],
        'The web app talks to the server over HTTP and socket.io only.',
      ),
    },
  },
  {
    files: ['apps/server/**/*.ts'],
    rules: boundary(['**/apps/web/**', 'react', 'react-dom', '@mui/*'], 'The server never imports web code.'),
  },
  {
    // A lib's build tsconfig leaves its specs and test fixtures out; its tsconfig.spec.json takes them in.
    files: ['libs/*/src/**/*.spec.ts', 'libs/*/src/testing/**/*.ts'],
    languageOptions: {
      parserOptions: {
        projectService: false,
        project: ['libs/*/tsconfig.spec.json'],
        tsconfigRootDir: import.meta.dirname,
      },
    },
  },
  {
    files: ['**/*.spec.ts', '**/*.spec.tsx', '**/*.e2e-spec.ts', '**/test/**/*.ts'],
    rules: {
      '@typescript-eslint/unbound-method': 'off',
      '@typescript-eslint/no-non-null-assertion': 'off',
    },
  },
);
