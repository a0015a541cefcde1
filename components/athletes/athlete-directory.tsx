"use client";

import { useInfiniteQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useDeferredValue, useState } from "react";
import { Button } from "@/components/ui/button";
import { Badge, Card, EmptyState } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import type { Page } from "@/lib/validation/common";
import type { AthleteDto } from "@/lib/validation/athletes";
import { AddAthleteForm } from "./add-athlete-form";

export interface StaffMember {
  id: string;
  name: string;
}

export function AthleteDirectory({ staff, me }: { staff: StaffMember[]; me: string }) {
  const [search, setSearch] = useState("");
  const [mine, setMine] = useState(false);
  const q = useDeferredValue(search.trim());
  const query = useInfiniteQuery({
    queryKey: ["athletes", { q, mine }],
    queryFn: ({ pageParam }) => {
      const params = new URLSearchParams({ limit: "25" });
      if (q) params.set("q", q);
      if (mine) params.set("mine", "true");
      if (pageParam) params.set("cursor", pageParam);
      return api<Page<AthleteDto>>(`/api/v1/athletes?${params}`);
    },
    initialPageParam: "",
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });
  const athletes = query.data?.pages.flatMap((p) => p.items) ?? [];

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_340px]">
      <section aria-label="Athlete list" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-end gap-3">
          <div className="min-w-60 flex-1">
            <TextField label="Search by name" value={search} onChange={(e) => setSearch(e.target.value)} />
          </div>
          <label className="flex h-11 items-center gap-2 text-sm font-semibold">
            <input type="checkbox" checked={mine} onChange={(e) => setMine(e.target.checked)} className="h-4 w-4" />
            Only my athletes
          </label>
        </div>
        {query.isPending ? <Spinner label="Loading athletes" /> : null}
        {query.isError ? <p className="text-danger">Couldn't load athletes. Try again in a moment.</p> : null}
        {query.isSuccess && athletes.length === 0 ? (
          <EmptyState title={q ? "Nobody matches that search" : "No athletes yet"}>
            {q ? "Try part of a first or last name." : "Add your first athlete with the form. You can invite them later."}
          </EmptyState>
        ) : null}
        <ul className="flex flex-col gap-2">
          {athletes.map((athlete) => (
            <li key={athlete.id}>
              <Link href={`/coach/athletes/${athlete.id}`} className="block">
                <Card className="flex items-center justify-between gap-3 p-4 hover:border-moss">
                  <div>
                    <p className="font-semibold">{athlete.name}</p>
                    <p className="text-sm text-muted">
                      {athlete.email ?? "No e-mail"} · coach: {athlete.primaryCoachId === me ? "you" : (athlete.primaryCoachName ?? "none")}
                    </p>
                  </div>
                  {athlete.hasAccount ? (
                    <Badge tone="moss">Signs in</Badge>
                  ) : athlete.invitePending ? (
                    <Badge tone="ember">Invite sent</Badge>
                  ) : (
                    <Badge>Logged by coach</Badge>
                  )}
                </Card>
              </Link>
            </li>
          ))}
        </ul>
        {query.hasNextPage ? (
          <Button variant="secondary" onClick={() => query.fetchNextPage()} disabled={query.isFetchingNextPage}>
            {query.isFetchingNextPage ? "Loading…" : "Show more"}
          </Button>
        ) : null}
      </section>
      <aside>
        <AddAthleteForm staff={staff} me={me} />
      </aside>
    </div>
  );
}
