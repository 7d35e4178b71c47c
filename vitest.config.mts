import { defineConfig } from 'vitest/config';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const __dirname = path.dirname(fileURLToPath(import.meta.url));

const alias = {
  '@': path.resolve(__dirname),
  'server-only': path.resolve(__dirname, 'tests/helpers/server-only-stub.ts'),
};

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          sequence: { groupOrder: 0 },
          include: [
            'lib/**/*.test.ts',
            'labels/**/*.test.ts',
            'server/**/*.test.ts',
            'tests/unit/**/*.test.ts',
            'tests/reference/**/*.test.ts',
            'app/**/_lib/**/*.test.ts',
          ],
          environment: 'node',
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          sequence: { groupOrder: 1 },
          include: ['tests/api/**/*.test.ts'],
          globalSetup: ['tests/helpers/global-setup.ts'],
          testTimeout: 30_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          // A browser waits on the server under a loaded CI machine; give polled checks room.
          expect: { poll: { timeout: 10_000 } },
          sequence: { groupOrder: 2 },
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/helpers/global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
