"use client";

import { useQuery } from "@tanstack/react-query";
import { api } from "@/lib/client/api";
import type { AthleteDto } from "@/lib/validation/athletes";
import type { Page } from "@/lib/validation/common";
import type { SquadDto } from "@/lib/validation/squads";

/** Every page of a list endpoint (squads and athletes stay in the hundreds for one team). */
async function allPages<T>(path: string): Promise<T[]> {
  const items: T[] = [];
  let cursor: string | null = null;
  do {
    const separator = path.includes("?") ? "&" : "?";
    const page: Page<T> = await api<Page<T>>(`${path}${separator}limit=100${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ""}`);
    items.push(...page.items);
    cursor = page.nextCursor;
  } while (cursor);
  return items;
}

export const SQUADS_KEY = ["squads", "all"] as const;

export function useSquads() {
  return useQuery({ queryKey: SQUADS_KEY, queryFn: () => allPages<SquadDto>("/api/v1/squads") });
}

export function useAllAthletes() {
  return useQuery({ queryKey: ["athletes", "all"], queryFn: () => allPages<AthleteDto>("/api/v1/athletes") });
}
