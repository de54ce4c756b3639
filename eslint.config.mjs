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
  {
    // Code that runs in the browser: keep classic zod (about 36 kB gzipped, not tree-shakable) out
    // of it — one classic import anywhere in the browser's graph also keeps all of zod's core in every
    // screen that uses zod/mini. Schemas there use '@/lib/validation/zod-mini'; the engine comes from
    // '@/lib/thermo/engine' (the '@/lib/thermo' entry adds the server's classic-zod request schema);
    // forms take their schemas from the *-forms / form-schemas modules, not the routes' versions.
    files: [
      'components/**',
      'lib/local/**',
      'lib/workbench/**',
      'lib/sheets/**',
      'lib/bench/**',
      'lib/thermo/**',
      'lib/validation/zod-mini.ts',
      'lib/validation/auth-forms.ts',
      'lib/validation/admin-forms.ts',
      'lib/editions/form-schemas.ts',
    ],
    ignores: ['**/*.test.ts', 'lib/thermo/index.ts', 'lib/thermo/request-schema.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          paths: [
            { name: 'zod', allowTypeImports: true, message: "Browser code: use '@/lib/validation/zod-mini' (classic zod loads whole)." },
            { name: '@/lib/thermo', message: "Browser code: import the engine from '@/lib/thermo/engine'." },
            { name: '@/lib/sync/protocol', allowTypeImports: true, message: "Browser code: the protocol's messages are classic zod; take the version from '@/lib/sync/protocol-version'." },
            { name: '@/lib/validation/auth', allowTypeImports: true, message: "Browser code: use '@/lib/validation/auth-forms'." },
            { name: '@/lib/validation/admin', allowTypeImports: true, message: "Browser code: use '@/lib/validation/admin-forms'." },
            { name: '@/lib/editions/schemas', allowTypeImports: true, message: "Browser code: use '@/lib/editions/form-schemas'." },
          ],
        },
      ],
    },
  },
];

export default config;
