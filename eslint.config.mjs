import nextCoreWebVitals from 'eslint-config-next/core-web-vitals';
import nextTypescript from 'eslint-config-next/typescript';

const config = [
  ...nextCoreWebVitals,
  ...nextTypescript,
  {
    ignores: ['node_modules/**', '.next/**', '.next-*/**', '.data/**', 'playwright-report/**', 'test-results/**', 'next-env.d.ts', 'coverage/**'],
  },
  {
    files: ['dsp/**/*.ts'],
    rules: {
      // dsp/ is pure: nothing from the app, the server or the framework.
      'no-restricted-imports': ['error', { patterns: ['@/app/*', '@/lib/*', '@/models/*', 'next', 'next/*', 'react', 'node:*', 'sequelize', 'pg'] }],
    },
  },
  {
    files: ['app/**/*.{ts,tsx}'],
    rules: {
      // Pages and handlers reach storage only through lib/data.
      'no-restricted-imports': ['error', { paths: ['sequelize'], patterns: ['@/models', '@/models/*'] }],
    },
  },
];

export default config;
