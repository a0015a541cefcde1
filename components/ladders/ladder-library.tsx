"use client";

import { useInfiniteQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useDeferredValue, useState } from "react";
import { Button } from "@/components/ui/button";
import { Badge, Card, EmptyState } from "@/components/ui/card";
import { SelectField, TextField } from "@/components/ui/field";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import type { Page } from "@/lib/validation/common";
import type { LadderSummaryDto } from "@/lib/validation/ladders";
import { ImportLadderForm } from "./import-ladder-form";
import { NewLadderForm } from "./new-ladder-form";

type Mode = "" | "auto" | "approve";

/** The team's ladders with search and filters, plus the forms that add one. */
export function LadderLibrary() {
  const [search, setSearch] = useState("");
  const [mode, setMode] = useState<Mode>("");
  const [archived, setArchived] = useState(false);
  const q = useDeferredValue(search.trim());
  const query = useInfiniteQuery({
    queryKey: ["ladders", { q, mode, archived }],
    queryFn: ({ pageParam }) => {
      const params = new URLSearchParams({ limit: "50" });
      if (q) params.set("q", q);
      if (mode) params.set("mode", mode);
      if (archived) params.set("archived", "true");
      if (pageParam) params.set("cursor", pageParam);
      return api<Page<LadderSummaryDto>>(`/api/v1/ladders?${params}`);
    },
    initialPageParam: "",
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });
  const ladders = query.data?.pages.flatMap((p) => p.items) ?? [];
  const filtered = Boolean(q || mode);

  return (
    <div className="grid gap-6 lg:grid-cols-[1fr_340px]">
      <section aria-label="Ladder list" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-end gap-3">
          <div className="min-w-60 flex-1">
            <TextField label="Search ladders" placeholder="Name or target skill" value={search} onChange={(e) => setSearch(e.target.value)} />
          </div>
          <div className="w-44">
            <SelectField label="Promotion" value={mode} onChange={(e) => setMode(e.target.value as Mode)}>
              <option value="">Any</option>
              <option value="auto">Automatic</option>
              <option value="approve">Coach approves</option>
            </SelectField>
          </div>
          <label className="flex h-11 items-center gap-2 text-sm font-semibold">
            <input type="checkbox" checked={archived} onChange={(e) => setArchived(e.target.checked)} className="h-4 w-4" />
            Show archived
          </label>
        </div>
        {query.isPending ? <Spinner label="Loading ladders" /> : null}
        {query.isError ? <p className="text-danger">Couldn't load ladders. Try again in a moment.</p> : null}
        {query.isSuccess && ladders.length === 0 ? (
          <EmptyState title={filtered ? "No ladder matches" : archived ? "Nothing archived" : "No ladders yet"}>
            {filtered
              ? "Try another word or clear the filters."
              : archived
                ? "Archived ladders keep their athletes and history; they show up here."
                : "Create one with the form, or import a ladder file."}
          </EmptyState>
        ) : null}
        <ul className="flex flex-col gap-2">
          {ladders.map((ladder) => (
            <li key={ladder.id}>
              <Link href={`/coach/ladders/${ladder.id}`} className="block">
                <Card className="flex items-center justify-between gap-3 p-4 hover:border-moss">
                  <div>
                    <p className="font-semibold">{ladder.name}</p>
                    <p className="text-sm text-muted">
                      {ladder.targetSkill} · {ladder.rungCount} {ladder.rungCount === 1 ? "rung" : "rungs"} · {ladder.athleteCount}{" "}
                      {ladder.athleteCount === 1 ? "athlete" : "athletes"}
                    </p>
                  </div>
                  <div className="flex flex-wrap justify-end gap-1">
                    {ladder.starter ? <Badge tone="sky">Starter</Badge> : null}
                    {ladder.archived ? <Badge>Archived</Badge> : null}
                    <Badge tone={ladder.promotionMode === "auto" ? "moss" : "ember"}>
                      {ladder.promotionMode === "auto" ? "Automatic" : "Coach approves"}
                    </Badge>
                  </div>
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
      <aside className="flex flex-col gap-6">
        <NewLadderForm />
        <ImportLadderForm />
      </aside>
    </div>
  );
}
