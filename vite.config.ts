import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { defineConfig } from 'vitest/config';

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: { '@': here('./src'), '@shared': here('./shared') },
  },
  build: { outDir: 'dist', sourcemap: true },
  test: {
    // The pinned AWS SDK runs on Node 20; silence its notice about releases that will need Node 22.
    env: { AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true' },
    // Four groups: the engine and the other pure units need nothing; integration tests need PostgreSQL and the stand-ins;
    // browser tests also need a built client and Chromium. Each group is a vitest project.
    projects: [
      {
        extends: true,
        test: {
          name: 'engine',
          include: ['tests/engine/**/*.test.ts'],
          setupFiles: ['tests/setup/fail-on-console-error.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.ts'],
          setupFiles: ['tests/setup/fail-on-console-error.ts'],
        },
      },
      {
        extends: true,
        test: {
          name: 'integration',
          include: ['tests/integration/**/*.test.ts', 'tests/fakes/**/*.test.ts'],
          globalSetup: ['tests/setup/global-setup.ts'],
          setupFiles: ['tests/setup/fail-on-console-error.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/setup/global-setup.ts'],
          setupFiles: ['tests/setup/fail-on-console-error.ts'],
          testTimeout: 120_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
