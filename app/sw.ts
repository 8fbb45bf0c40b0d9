/// <reference lib="webworker" />
// Hitchmark's service worker (built by @serwist/next into public/sw.js). The app's JS and CSS are
// precached at install; pages are fetched network-first and kept, so a page a driver or jockey has
// opened once (the gate, a handoff form, a yard walk) opens again on a reload without signal.
// Writes (POST) are never cached or replayed here: the page's own queue sends them (lib/offline).
import { defaultCache } from '@serwist/next/worker';
import type { PrecacheEntry, SerwistGlobalConfig } from 'serwist';
import { Serwist } from 'serwist';

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}

declare const self: ServiceWorkerGlobalScope;

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: true,
  runtimeCaching: defaultCache,
});

serwist.addEventListeners();
