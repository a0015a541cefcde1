"use client";

import { useMutation, useQueryClient, type QueryKey } from "@tanstack/react-query";
import { useCallback, useEffect, useRef, useState } from "react";
import { enqueue, newIdempotencyKey, pendingFor, removePending, type PendingWrite } from "@/lib/client/offline-queue";

/** A write as the screen describes it; the key and the queue time are added when it is queued. */
export type PendingDraft = PendingWrite extends infer W ? (W extends PendingWrite ? Omit<W, "key" | "queuedAt"> : never) : never;
import { sendPending, type TodayEndpoints } from "@/lib/client/send-pending";

const RETRY_EVERY_MS = 15_000;

/**
 * The queue of unsent writes for one athlete: a write shows at once as pending (optimistic), is
 * kept in IndexedDB, and is sent now, on reconnect, on the next load, or every few seconds while
 * online. When anything went through, the day is refetched so pending rows become logged rows.
 */
export function usePendingWrites(athleteId: string | undefined, endpoints: TodayEndpoints, todayKey: QueryKey) {
  const queryClient = useQueryClient();
  const [pending, setPending] = useState<PendingWrite[]>([]);
  const flushing = useRef<Promise<void> | null>(null);

  const reload = useCallback(async () => {
    if (athleteId) setPending(await pendingFor(athleteId));
  }, [athleteId]);

  const flush = useCallback(() => {
    if (!athleteId) return Promise.resolve();
    flushing.current ??= (async () => {
      try {
        const sent = await sendPending(athleteId, endpoints);
        if (sent > 0) await queryClient.invalidateQueries({ queryKey: todayKey });
      } finally {
        flushing.current = null;
        await reload();
      }
    })();
    return flushing.current;
  }, [athleteId, endpoints, queryClient, todayKey, reload]);

  useEffect(() => {
    const first = window.setTimeout(() => void reload().then(flush), 0);
    const onOnline = () => void flush();
    window.addEventListener("online", onOnline);
    const timer = window.setInterval(() => {
      if (navigator.onLine) void flush();
    }, RETRY_EVERY_MS);
    return () => {
      window.removeEventListener("online", onOnline);
      window.clearInterval(timer);
      window.clearTimeout(first);
    };
  }, [reload, flush]);

  const queue = useMutation({
    // Never paused offline: the write must reach IndexedDB at once; sending waits for the network.
    networkMode: "always",
    mutationFn: async (write: PendingWrite) => {
      await enqueue(write);
      await flush();
    },
    onMutate: (write) => setPending((list) => [...list.filter((w) => w.key !== write.key), write]),
  });

  const discard = useCallback(
    async (key: string) => {
      await removePending(key);
      await reload();
    },
    [reload],
  );

  const { mutate } = queue;
  /** Each write gets its Idempotency-Key here, once, and keeps it through every retry. */
  const add = useCallback((draft: PendingDraft) => mutate({ ...draft, key: newIdempotencyKey(), queuedAt: Date.now() } as PendingWrite), [mutate]);

  return { pending, queue: add, flush, discard };
}
