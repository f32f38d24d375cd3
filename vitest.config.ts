import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('.', import.meta.url));

export default defineConfig({
  resolve: { alias: { '@': root } },
  test: {
    projects: [
      { extends: true, test: { name: 'lattice', include: ['tests/lattice/**/*.test.ts'], environment: 'node' } },
      { extends: true, test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], environment: 'node' } },
      {
        extends: true,
        test: {
          name: 'db',
          include: ['tests/db/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
          globalSetup: ['tests/db/global-setup.ts'],
          setupFiles: ['tests/db/setup.ts'],
          env: {
            PG_DATABASE: process.env.PG_TEST_DATABASE ?? 'leeway_test',
            // The auth library is called in-process, as by a server listening on loopback only
            // (what scripts/serve.ts says for `npm start`; lib/listen-host.ts).
            LEEWAY_LISTEN_HOST: '127.0.0.1',
            ...(process.env.TEST_DATABASE_URL ? { DATABASE_URL: process.env.TEST_DATABASE_URL } : {}),
          },
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 180_000,
          // expect.poll's 1 s default failed once on a loaded two-core CI machine.
          expect: { poll: { timeout: 15_000, interval: 100 } },
          globalSetup: ['tests/e2e/global-setup.ts'],
          env: { PG_DATABASE: process.env.PG_TEST_DATABASE ?? 'leeway_test' },
        },
      },
    ],
  },
});
