import nextCoreWebVitals from 'eslint-config-next/core-web-vitals';
import nextTypescript from 'eslint-config-next/typescript';

// lib/scoring is a pure computation library: no framework, no database, no I/O. The CLI is the
// one file there allowed to read files.
const SCORING_FORBIDDEN = [
  { group: ['next', 'next/*', 'react', 'react/*', 'react-dom', 'react-dom/*'], message: 'lib/scoring must not depend on the UI framework.' },
  { group: ['@/db', '@/db/*', '**/db/*', 'drizzle-orm', 'drizzle-orm/*', 'mysql2', 'mysql2/*'], message: 'lib/scoring must not touch the database.' },
  {
    group: ['fs', 'node:fs', 'fs/*', 'node:fs/*', 'net', 'node:net', 'http', 'node:http', 'https', 'node:https', 'child_process', 'node:child_process', 'stripe', 'nodemailer', 'uploadthing', 'uploadthing/*', 'sharp'],
    message: 'lib/scoring must not do I/O.',
  },
  { group: ['@/*', '../*/..', '../../*'], message: 'lib/scoring imports only its own modules and pure packages.' },
];

const config = [
  ...nextCoreWebVitals,
  ...nextTypescript,
  {
    // The React Compiler is not enabled, so its warning about libraries it cannot memoise
    // (react-hook-form's watch, TanStack Table) does not apply.
    rules: { 'react-hooks/incompatible-library': 'off' },
  },
  { ignores: ['.next/**', '.next-*/**', 'node_modules/**', '.data/**', 'tmp/**', 'db/migrations/**', 'next-env.d.ts'] },
  {
    files: ['lib/scoring/**/*.ts'],
    ignores: ['lib/scoring/cli.ts', 'lib/scoring/**/*.test.ts'],
    rules: {
      'no-restricted-imports': ['error', { patterns: SCORING_FORBIDDEN }],
      'no-restricted-globals': ['error', { name: 'fetch', message: 'lib/scoring must not do I/O.' }, { name: 'process', message: 'lib/scoring must not read the environment.' }],
    },
  },
];

export default config;
