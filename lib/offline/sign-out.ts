// What signing out removes from the phone. The service worker's caches of pages and API answers
// hold what the user saw (trailers, names, photos); the app's own scripts and styles (the
// precache and the static-asset caches) hold nothing personal and stay, so the sign-in page
// still opens without signal.

const KEEP = [/precache/, /^static-/, /^next-static-/];

/** The cache names to delete at sign-out. */
export function cachesToClear(names: readonly string[]): string[] {
  return names.filter((n) => !KEEP.some((k) => k.test(n)));
}
