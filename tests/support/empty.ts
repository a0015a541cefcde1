// Stand-in for the `server-only` marker package outside Next.js (vitest, worker, seed scripts).
export {};
