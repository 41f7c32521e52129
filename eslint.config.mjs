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
  {
    // No import cycles anywhere in the app: layers import downward only (dsp ← lib ← components ← app).
    files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}', 'lib/**/*.{ts,tsx}', 'dsp/**/*.ts', 'models/**/*.ts', 'migrations/**/*.ts'],
    rules: {
      'import/no-cycle': ['error', { ignoreExternal: true }],
    },
  },
  {
    // A soft size limit: a file past 300 lines usually holds two ideas. Named exceptions below.
    files: ['app/**/*.{ts,tsx}', 'components/**/*.{ts,tsx}', 'lib/**/*.{ts,tsx}', 'dsp/**/*.ts', 'models/**/*.ts', 'scripts/**/*.ts'],
    ignores: [
      'lib/openapi/operations/**', // the API's operations: data, one file a route group
      'scripts/test.ts', // the one test runner, read top to bottom
    ],
    rules: {
      'max-lines': ['error', { max: 300, skipBlankLines: true, skipComments: true }],
    },
  },
  {
    // Components reach stored data through the API (SWR hooks), never the server's data layer: types only.
    files: ['components/**/*.{ts,tsx}'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { patterns: [{ group: ['@/lib/data', '@/lib/data/*', '@/models', '@/models/*'], allowTypeImports: true, message: 'Components may import types from lib/data, never its functions (use the API through lib/hooks).' }] },
      ],
    },
  },
];

export default config;
