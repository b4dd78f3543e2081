// Lint rules for the whole repository. The import-boundary rules encode the layering described in
// docs/architecture.md: shared → (server | src); server and src never import each other; a client
// feature never reaches into another feature; shared never imports a framework or the database.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';

const framework = ['express', 'express/*', 'drizzle-orm', 'drizzle-orm/*', 'react', 'react-dom', 'react/*', 'pg', 'better-auth', 'better-auth/*', 'node:*'];

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'drizzle/**', 'uploads/**', 'data/**', 'coverage/**', 'public/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['shared/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: ['**/server/**', '**/src/**'], message: 'shared/ must not import server/ or src/: it loads in the browser and in Node.' },
          { group: framework, message: 'shared/ stays free of frameworks, the database and Node built-ins.' },
        ],
      }],
    },
  },
  {
    files: ['server/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [{ group: ['**/src/**', '!**/shared/**'], message: 'server/ never imports the client (src/).' }],
      }],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    ignores: ['src/features/**'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [{ group: ['**/server/**'], message: 'src/ never imports the server; talk to it over HTTP.' }],
      }],
    },
  },
  {
    // Features do not import each other (imports flow shared → features → routes/app).
    files: ['src/features/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: ['**/server/**'], message: 'src/ never imports the server; talk to it over HTTP.' },
          { regex: '^\\.\\./\\.\\./(?!\\.\\.)(?!lib/|components/|paths|query-keys)[^/]+/', message: 'A feature never imports another feature: move the shared part to src/lib or src/components.' },
          { regex: '^\\.\\./\\.\\./\\.\\./features/', message: 'A feature never imports another feature.' },
        ],
      }],
    },
  },
);
