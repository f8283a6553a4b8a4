import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';
import setline from './eslint-rules/client-imports.mjs';

// The layering of DEVELOPERS.md, held by the linter (why each rule exists is written there):
// - models and the Sequelize instance only behind lib/data (and lib/auth, lib/queue for the sign-in and the queue);
// - components never import from app/ (a page's parts live beside it; shared parts live in components/);
// - a 'use client' file never imports a server-only module (eslint-rules/client-imports.mjs);
// - only lib/env.ts (and the client-safe lib/env-public.ts) read process.env in app/, components/, lib/.

const MODELS = {
  group: ['@/models', '@/models/*', '**/models', '**/models/*'],
  message: 'Models are used only in lib/data (and lib/auth): call or add a lib/data function instead.',
};
const DATABASE = {
  group: ['@/lib/data/db', '**/lib/data/db'],
  message: 'The Sequelize instance is used only in lib/data (and lib/auth, lib/queue): add a lib/data function.',
};
const APP = {
  group: ['@/app', '@/app/*', '**/app/*'],
  message: 'components/ never imports from app/: move the shared piece into components/ or lib/.',
};

const APP_CODE = ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}', 'lib/**/*.{ts,tsx}'];

const config = [
  ...nextVitals,
  ...nextTs,
  { ignores: ['.next/**', 'node_modules/**', '.data/**', 'test-results/**', 'playwright-report/**', 'next-env.d.ts'] },
  {
    files: ['**/*.cjs'],
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
  {
    files: APP_CODE,
    ignores: ['lib/data/**', 'lib/auth/**', 'lib/queue/**'],
    rules: { 'no-restricted-imports': ['error', { patterns: [MODELS, DATABASE] }] },
  },
  {
    files: ['lib/queue/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': ['error', { patterns: [MODELS] }] },
  },
  {
    files: ['components/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': ['error', { patterns: [MODELS, DATABASE, APP] }] },
  },
  {
    files: APP_CODE,
    plugins: { setline },
    rules: { 'setline/no-server-import-in-client': 'error' },
  },
  {
    // instrumentation.ts checks NEXT_RUNTIME before anything is imported, so it keeps its two reads.
    files: [...APP_CODE, 'proxy.ts'],
    ignores: ['lib/env.ts', 'lib/env-public.ts'],
    rules: {
      'no-restricted-properties': [
        'error',
        { object: 'process', property: 'env', message: 'Read the environment through lib/env.ts (env()).' },
      ],
    },
  },
];

export default config;
