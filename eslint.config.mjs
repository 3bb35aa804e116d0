// Lint and layer rules (DEVELOPERS.md, "Layers"). `npm run lint` runs it with --max-warnings 0.
import { defineConfig, globalIgnores } from 'eslint/config';
import nextCoreWebVitals from 'eslint-config-next/core-web-vitals';
import nextTypescript from 'eslint-config-next/typescript';
import tseslint from 'typescript-eslint';

/** Packages that do I/O or need a server: none of them belongs in the pure computation of lib/. */
const SERVER_PACKAGES = ['knex', 'better-sqlite3', 'sharp', 'nodemailer', 'smtp-server', 'server-only', 'next-auth'];

/** `import/no-restricted-paths` zone: files under `target` may not import from any of `from`. */
const zone = (target, from, message) => ({ target, from, message });

export default defineConfig([
  globalIgnores(['build/**', '.next/**', '.next-*/**', 'out/**', 'data/**', 'test-results/**', 'playwright-report/**', 'next-env.d.ts']),
  ...nextCoreWebVitals,
  ...nextTypescript,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      'import/no-restricted-paths': [
        'error',
        {
          zones: [
            zone('./lib', ['./app', './db', './components', './pdf'], 'lib/ is pure computation: pass data in, do not reach into app/, db/, components/ or pdf/.'),
            zone('./db', ['./app', './components'], 'db/ is data access: it serves app/, never imports from it or from components/.'),
            zone('./components', ['./db', './app/lib', './app/api'], 'components/ is React UI: take data as props from a page, not from server modules.'),
            zone('./pdf', ['./db', './app', './components'], 'pdf/ draws documents from data it is given: no db/, app/ or components/.'),
          ],
        },
      ],
    },
  },
  {
    files: ['lib/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: SERVER_PACKAGES.map((name) => ({ name, message: 'lib/ is pure computation: no database, image, mail or server package.' })),
          patterns: [
            { group: ['react', 'react-dom', 'react/*', 'react-dom/*'], message: 'lib/ holds no React: put UI in components/.' },
            { group: ['next', 'next/*'], message: 'lib/ holds no Next.js: put routes and server helpers in app/.' },
            { group: ['node:fs', 'node:fs/*', 'fs', 'fs/*', 'node:child_process', 'node:net', 'node:http'], message: 'lib/ does no I/O.' },
          ],
        },
      ],
    },
  },
  {
    files: ['components/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: SERVER_PACKAGES.map((name) => ({ name, message: 'components/ imports no server-only module: let a page in app/ load the data.' })),
          patterns: [{ group: ['@/db/*', '@/app/lib/*', '@/app/api/*', '@/pdf/render-*', '@/pdf/fonts'], message: 'components/ imports no server-only module: let a page in app/ load the data.' }],
        },
      ],
    },
  },
  {
    // The server thread never loads react-pdf or the fonts (hundreds of MB once per process): every PDF is drawn in
    // the worker pool (app/lib/pdf-pool.ts), which is sent plain data. Types from pdf/ are fine: they vanish in the build.
    files: ['app/**'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          paths: [{ name: '@react-pdf/renderer', allowTypeImports: true, message: 'PDFs are drawn in the worker pool (app/lib/pdf-pool.ts), not on the server thread.' }],
          patterns: [{ group: ['@/pdf/*'], allowTypeImports: true, message: 'PDFs are drawn in the worker pool (app/lib/pdf-pool.ts): import only types from pdf/.' }],
        },
      ],
    },
  },
  {
    files: ['pdf/**'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [{ group: ['@/db/*', 'knex', 'better-sqlite3'], message: 'pdf/ draws from data it is given: no db/.' }] }],
    },
  },
  {
    files: ['db/**'],
    rules: {
      'no-restricted-imports': [
        'error',
        { patterns: [{ group: ['@/app/*', '@/components/*', 'react', 'next', 'next/*'], message: 'db/ serves app/: it imports nothing from app/ or components/.' }] },
      ],
    },
  },
  {
    // Test helpers named use… (useMailFakeForFile) are vitest set-up, not React hooks.
    files: ['tests/**/*.ts'],
    rules: { 'react-hooks/rules-of-hooks': 'off' },
  },
]);
