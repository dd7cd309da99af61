import { registerSW } from 'virtual:pwa-register';

/**
 * The service worker the build made (vite-plugin-pwa, Workbox): it keeps the app shell and the crew's job data for
 * use without a connection. A new build waits until the person chooses to reload onto it (`newVersionReady`), so a
 * half-typed form is never reloaded away. In development (`npm start`) there is no worker, so edits are never
 * hidden behind a cached copy.
 */
let ready = false;
let update: ((reload?: boolean) => Promise<void>) | undefined;
const listeners = new Set<() => void>();

export function registerServiceWorker() {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  update = registerSW({
    immediate: true,
    onNeedRefresh: () => {
      ready = true;
      listeners.forEach((listener) => listener());
    },
  });
}

export const newVersionReady = {
  subscribe(listener: () => void) {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  get: () => ready,
  /** Hands over to the waiting worker and reloads the page onto the new build. */
  reloadOntoIt: () => update?.(true),
};

/** The crew's cached job data; removed at sign-out so the next person on this phone does not read it offline. */
export const crewDataCache = 'gradepass-crew-data';

export async function forgetCachedData() {
  if (typeof caches === 'undefined') return;
  await caches.delete(crewDataCache);
}
