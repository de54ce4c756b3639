import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('.', import.meta.url));

export default defineConfig({
  resolve: { alias: { '@': root, 'server-only': `${root}tests/support/server-only-stub.ts` } },
  test: {
    projects: [
      {
        extends: true,
        test: { name: 'unit', include: ['lib/**/*.test.ts', 'db/**/*.test.ts', 'components/**/*.test.ts'], environment: 'node' },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts'],
          environment: 'node',
          // One MariaDB database and one app server: the suites run one file at a time.
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
