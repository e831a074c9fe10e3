/**
 * The service worker: keeps a copy of the whole app — the list of files the build writes into it
 * (`self.__WB_MANIFEST`, by vite-plugin-pwa) — so the app opens and plans offline after the first
 * visit; answers from that copy first; and leaves a new version waiting until the user agrees to update
 * (the page then posts "SKIP_WAITING"). A few lines of our own instead of the Workbox runtime: the app
 * needs a precache, a navigation fallback and an update on request, nothing else.
 */

interface PrecacheEntry {
  url: string;
  revision: string | null;
}
interface ExtendableEvent extends Event {
  waitUntil(p: Promise<unknown>): void;
}
interface FetchEvent extends ExtendableEvent {
  readonly request: Request;
  respondWith(r: Response | Promise<Response>): void;
}
interface WorkerScope {
  __WB_MANIFEST: PrecacheEntry[];
  registration: { scope: string };
  skipWaiting(): Promise<void>;
  addEventListener(type: "install" | "activate", listener: (e: ExtendableEvent) => void): void;
  addEventListener(type: "fetch", listener: (e: FetchEvent) => void): void;
  addEventListener(type: "message", listener: (e: MessageEvent<unknown>) => void): void;
}

const sw = self as unknown as WorkerScope;
// Written as `self.__WB_MANIFEST`: the build looks for exactly that to put the list in.
const files = (self as unknown as WorkerScope).__WB_MANIFEST;

/** FNV-1a of a string, base 36: names this version's cache after every file and its revision. */
function fnv(s: string): string {
  let h = 0x811c9dc5;
  for (let k = 0; k < s.length; k++) h = Math.imul(h ^ s.charCodeAt(k), 0x01000193);
  return (h >>> 0).toString(36);
}

const PREFIX = "taut-app-";
const CACHE = PREFIX + fnv(files.map((f) => `${f.url} ${f.revision ?? ""}`).join("\n"));
const full = (url: string) => new URL(url, sw.registration.scope).href;
const INDEX = full("index.html");

sw.addEventListener("install", (e) => {
  // Each file once (the build lists the icons and the web manifest twice; a repeated request fails the
  // whole copy), fetched past the browser's HTTP cache so the copy is of this version.
  const urls = [...new Set(files.map((f) => full(f.url)))];
  e.waitUntil(caches.open(CACHE).then((c) => c.addAll(urls.map((u) => new Request(u, { cache: "reload" })))));
});

sw.addEventListener("activate", (e) => {
  e.waitUntil(caches.keys().then((keys) => Promise.all(keys.filter((k) => k.startsWith(PREFIX) && k !== CACHE).map((k) => caches.delete(k)))));
});

sw.addEventListener("message", (e) => {
  if ((e.data as { type?: unknown } | null)?.type === "SKIP_WAITING") void sw.skipWaiting();
});

sw.addEventListener("fetch", (e) => {
  const req = e.request;
  // Anything but a GET goes to the network: the app's reachability check (a HEAD, createConnection.ts) relies on it.
  if (req.method !== "GET" || !req.url.startsWith(sw.registration.scope)) return;
  // Every page of the app is index.html (the screens are hash routes); files by their address, without a query.
  const key = req.mode === "navigate" ? INDEX : req.url.split(/[?#]/)[0]!;
  e.respondWith(
    caches
      .open(CACHE)
      .then((c) => c.match(key))
      .then((hit) => hit ?? fetch(req)),
  );
});
