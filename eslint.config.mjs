import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';

const engineBoundary = {
  files: ['engine/**/*.ts'],
  rules: {
    'no-restricted-imports': [
      'error',
      {
        patterns: [
          {
            group: ['react', 'react-dom', 'react/*', 'next', 'next/*', 'next-auth', 'next-auth/*', '@xyflow/*', 'sequelize', 'pg', 'pg-boss', 'zustand', '@/app/*', '@/components/*', '@/lib/*', '@/models/*', '../lib/*', '../models/*'],
            message: 'engine/ is pure TypeScript: no React, Next, database or app imports.',
          },
        ],
      },
    ],
    'no-restricted-globals': ['error', 'window', 'document', 'localStorage'],
  },
};

const config = [
  { ignores: ['.next/**', 'node_modules/**', '.data/**', 'next-env.d.ts', 'test-results/**', 'playwright-report/**', 'public/**'] },
  ...nextVitals,
  ...nextTs,
  engineBoundary,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
];

export default config;
