import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // The service worker (Workbox, generated at build): the app shell is precached; the crew's job data is kept from
    // the last time it was read with a connection. DEVELOPERS.md, "Crews without signal", says how it fits together.
    VitePWA({
      strategies: 'generateSW',
      // Registered from src/main.tsx (virtual:pwa-register), never by an inline script the CSP would refuse.
      injectRegister: false,
      // A new build waits until the person chooses to reload (a banner offers it), so no half-typed reading is lost.
      registerType: 'prompt',
      manifest: {
        name: 'Gradepass',
        short_name: 'Gradepass',
        description: 'Driveway entrance requests, grade checks and crew field sheets.',
        id: '/',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        background_color: '#f7f5ef',
        theme_color: '#153a2c',
        icons: [
          { src: '/icons/app-icon-192.png', sizes: '192x192', type: 'image/png' },
          { src: '/icons/app-icon-512.png', sizes: '512x512', type: 'image/png' },
          { src: '/icons/app-icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
          { src: '/icons/app-icon.svg', sizes: 'any', type: 'image/svg+xml' },
        ],
      },
      workbox: {
        // The shell: every built script, style, font and icon. Source maps and the solver's WebAssembly stay out
        // (the design proposal is an office tool and needs the server anyway).
        globPatterns: ['**/*.{js,css,html,svg,png,woff2}'],
        globIgnores: ['**/*.map', '**/design-worker*'],
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
        navigateFallback: '/index.html',
        // The server's own addresses are never answered with the app shell.
        navigateFallbackDenylist: [/^\/api\//, /^\/auth\//],
        cleanupOutdatedCaches: true,
        clientsClaim: true,
        runtimeCaching: [
          {
            // Who is signed in, the crew's own jobs, each job's field sheet and as-built page, and its messages:
            // from the network whenever it answers, the copy from the last good answer only when it cannot. The wait
            // is long on purpose: a slow but working server must never be overruled by an older copy (a job shown
            // as not started when it is), and with no signal at all the request fails at once anyway.
            urlPattern: ({ url, sameOrigin }) =>
              sameOrigin &&
              (url.pathname === '/api/me' ||
                url.pathname === '/api/crew/my-jobs' ||
                /^\/api\/crew\/jobs\/[0-9a-f-]{36}\/(field-sheet|as-built)$/.test(url.pathname) ||
                /^\/api\/requests\/[0-9a-f-]{36}\/messages$/.test(url.pathname)),
            handler: 'NetworkFirst',
            method: 'GET',
            options: {
              cacheName: 'gradepass-crew-data',
              networkTimeoutSeconds: 30,
              cacheableResponse: { statuses: [200] },
              expiration: { maxEntries: 300, maxAgeSeconds: 30 * 24 * 60 * 60 },
            },
          },
        ],
      },
    }),
  ],
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
