"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/client/api";
import type { LadderDto, LadderPatch } from "@/lib/validation/ladders";

export const ladderKey = (id: string) => ["ladder", id] as const;

/** One ladder, seeded with the server-rendered copy. */
export function useLadder(initial: LadderDto) {
  return useQuery({
    queryKey: ladderKey(initial.id),
    queryFn: () => api<LadderDto>(`/api/v1/ladders/${initial.id}`),
    initialData: initial,
  });
}

/** Refetch the ladder and the list after any change. */
export function useLadderRefresh(id: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: ladderKey(id) }),
      queryClient.invalidateQueries({ queryKey: ["ladders"] }),
    ]);
}

export function usePatchLadder(id: string) {
  const queryClient = useQueryClient();
  const refresh = useLadderRefresh(id);
  return useMutation({
    mutationFn: (patch: LadderPatch) => api<LadderDto>(`/api/v1/ladders/${id}`, { method: "PATCH", json: patch }),
    onSuccess: (ladder) => {
      queryClient.setQueryData(ladderKey(id), ladder);
      void refresh();
    },
  });
}

/**
 * Reorders rungs optimistically: the list moves at once, and snaps back (with an error) when the
 * server refuses.
 */
export function useReorderRungs(id: string) {
  const queryClient = useQueryClient();
  const refresh = useLadderRefresh(id);
  return useMutation({
    mutationFn: (rungIds: string[]) => api<LadderDto>(`/api/v1/ladders/${id}/rungs/order`, { method: "PUT", json: { rungIds } }),
    onMutate: async (rungIds) => {
      await queryClient.cancelQueries({ queryKey: ladderKey(id) });
      const previous = queryClient.getQueryData<LadderDto>(ladderKey(id));
      if (previous) {
        const byId = new Map(previous.rungs.map((r) => [r.id, r]));
        const rungs = rungIds.flatMap((rungId, i) => {
          const rung = byId.get(rungId);
          return rung ? [{ ...rung, position: i + 1 }] : [];
        });
        queryClient.setQueryData<LadderDto>(ladderKey(id), { ...previous, rungs });
      }
      return { previous };
    },
    onError: (_error, _ids, context) => {
      if (context?.previous) queryClient.setQueryData(ladderKey(id), context.previous);
    },
    onSettled: () => void refresh(),
  });
}
