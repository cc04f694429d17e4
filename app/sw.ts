// The service worker (built by `serwist build` from serwist.config.mjs into public/sw.js, after
// `next build`): precaches the build's static files, and keeps the judging page, its session and
// the entries' photos so a judging tablet opens and works without a network. Sheet changes are
// not the worker's business: the page keeps them in IndexedDB and sends them itself.
import { CacheFirst, ExpirationPlugin, NetworkFirst, Serwist, type PrecacheEntry, type RuntimeCaching } from "serwist";

// Typed by hand (not with the "webworker" lib, which would clash with the app's "dom" lib).
declare const self: { __SW_MANIFEST: (PrecacheEntry | string)[] | undefined };

const JUDGING_PAGE = /^\/shows\/[^/]+\/judging\/?$/;

const judging: RuntimeCaching[] = [
  {
    // The page's RSC payload, for a client-side move to it (before the HTML rule: same path).
    matcher: ({ request, url, sameOrigin }) => sameOrigin && request.headers.get("RSC") === "1" && JUDGING_PAGE.test(url.pathname),
    handler: new NetworkFirst({ cacheName: "judging-rsc", networkTimeoutSeconds: 5 }),
  },
  {
    // The page's HTML: a reload or opening the installed app, and the warm-up fetch the page
    // makes once this worker controls it (components/judging/register-worker.tsx), since the
    // very first load happens before the worker exists. Vary is ignored: RSC has its own cache.
    matcher: ({ request, url, sameOrigin }) => sameOrigin && request.method === "GET" && JUDGING_PAGE.test(url.pathname),
    handler: new NetworkFirst({ cacheName: "judging-pages", networkTimeoutSeconds: 5, matchOptions: { ignoreVary: true } }),
  },
  {
    matcher: ({ url, sameOrigin }) => sameOrigin && /^\/api\/shows\/[^/]+\/judging\/session$/.test(url.pathname),
    handler: new NetworkFirst({ cacheName: "judging-api", networkTimeoutSeconds: 5 }),
  },
  {
    // Photo versions never change under an id (a new upload is a new id).
    matcher: ({ url, sameOrigin }) => sameOrigin && /^\/api\/photos\/[^/]+\/(web|thumb)$/.test(url.pathname),
    handler: new CacheFirst({ cacheName: "judging-photos", plugins: [new ExpirationPlugin({ maxEntries: 2000, maxAgeSeconds: 14 * 24 * 60 * 60 })] }),
  },
];

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: true,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching: judging,
});

serwist.addEventListeners();
