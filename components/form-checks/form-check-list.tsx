"use client";

import { useInfiniteQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Badge, Card, EmptyState } from "@/components/ui/card";
import { SelectField } from "@/components/ui/field";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import type { Page } from "@/lib/validation/common";
import type { FormCheckDto } from "@/lib/validation/form-checks";

const DATE = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit" });

/** Form checks newest first; staff can narrow to one athlete. */
export function FormCheckList({
  basePath,
  athletes,
  emptyText,
}: {
  basePath: string;
  athletes?: { id: string; name: string }[];
  emptyText: string;
}) {
  const [athleteId, setAthleteId] = useState("");
  const query = useInfiniteQuery({
    queryKey: ["form-checks", { athleteId }],
    queryFn: ({ pageParam }) => {
      const params = new URLSearchParams({ limit: "20" });
      if (athleteId) params.set("athleteId", athleteId);
      if (pageParam) params.set("cursor", pageParam);
      return api<Page<FormCheckDto>>(`/api/v1/form-checks?${params}`);
    },
    initialPageParam: "",
    getNextPageParam: (last) => last.nextCursor ?? undefined,
  });
  const items = query.data?.pages.flatMap((p) => p.items) ?? [];

  return (
    <section aria-label="Form checks" className="flex flex-col gap-3">
      {athletes ? (
        <div className="max-w-xs">
          <SelectField label="Athlete" value={athleteId} onChange={(e) => setAthleteId(e.target.value)}>
            <option value="">Everyone</option>
            {athletes.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </SelectField>
        </div>
      ) : null}
      {query.isPending ? <Spinner label="Loading form checks" /> : null}
      {query.isError ? <p className="text-danger">Couldn&apos;t load form checks. Try again in a moment.</p> : null}
      {query.isSuccess && items.length === 0 ? <EmptyState title="No form checks yet">{emptyText}</EmptyState> : null}
      <ul className="flex flex-col gap-2">
        {items.map((item) => (
          <li key={item.id}>
            <Link href={`${basePath}/${item.id}`} className="block">
              <Card className="flex items-center gap-4 p-3 hover:border-moss">
                <div className="flex h-16 w-24 shrink-0 items-center justify-center overflow-hidden rounded-lg bg-sunken text-xs text-muted">
                  {item.poster ? (
                    // eslint-disable-next-line @next/next/no-img-element -- a data URL thumbnail; nothing to optimise
                    <img src={item.poster} alt="" className="h-full w-full object-cover" />
                  ) : (
                    <span>{item.kind === "video" ? "Video" : "Photo"}</span>
                  )}
                </div>
                <div className="min-w-0 flex-1">
                  <p className="truncate font-semibold">{athletes ? item.athleteName : (item.rungName ?? item.fileName ?? "Form check")}</p>
                  <p className="truncate text-sm text-muted">
                    {DATE.format(new Date(item.createdAt))}
                    {item.rungName && athletes ? ` · ${item.rungName}` : ""}
                    {item.note ? ` · ${item.note}` : ""}
                  </p>
                </div>
                <Badge tone={item.commentCount > 0 ? "moss" : "neutral"}>
                  {item.commentCount === 0 ? "Awaiting review" : `${item.commentCount} comment${item.commentCount === 1 ? "" : "s"}`}
                </Badge>
              </Card>
            </Link>
          </li>
        ))}
      </ul>
      {query.hasNextPage ? (
        <Button variant="secondary" onClick={() => void query.fetchNextPage()} disabled={query.isFetchingNextPage}>
          {query.isFetchingNextPage ? "Loading…" : "Show more"}
        </Button>
      ) : null}
    </section>
  );
}
