import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';

const config = [
  ...nextVitals,
  ...nextTs,
  { ignores: ['.next/**', '.next-slot-*/**', 'backups/**', 'node_modules/**', 'public/**', '.data/**', 'drizzle/**', 'next-env.d.ts', 'test-results/**', 'playwright-report/**'] },
  {
    rules: {
      // We do not run the React Compiler; TanStack Table's hook is fine without its memoisation.
      'react-hooks/incompatible-library': 'off',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
];

export default config;
