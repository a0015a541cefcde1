/**
 * The service worker keeps the athlete's own pages (Today, history) for offline use. They hold
 * personal data, so signing out drops them: the next person on a shared phone cannot open them.
 * Static assets stay (nothing personal, and the next sign-in is faster). Unsent sets stay in
 * IndexedDB under their athlete's id and are only shown to, and sent for, that athlete.
 */
const PAGE_CACHE_PREFIX = "rungwise-pages-";

export async function forgetOfflinePages(): Promise<void> {
  if (typeof caches === "undefined") return;
  const keys = await caches.keys();
  await Promise.all(keys.filter((key) => key.startsWith(PAGE_CACHE_PREFIX)).map((key) => caches.delete(key)));
}
