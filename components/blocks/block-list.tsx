"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { Badge, Card, EmptyState } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import { formatDuration } from "@/lib/training/block-estimate";
import type { BlockDto } from "@/lib/validation/blocks";
import type { Page } from "@/lib/validation/common";

/** The team's blocks with their estimate, slots and any pairing warnings. */
export function BlockList() {
  const blocks = useQuery({ queryKey: ["blocks", "list"], queryFn: () => api<Page<BlockDto>>("/api/v1/blocks?limit=100") });
  if (blocks.isPending) return <Spinner label="Loading blocks" />;
  if (blocks.isError) return <p className="text-danger">Couldn&apos;t load blocks. Try again in a moment.</p>;
  if (blocks.data.items.length === 0) {
    return (
      <EmptyState title="No blocks yet" action={<Link href="/coach/blocks/new" className={buttonClass()}>Build the first block</Link>}>
        A block is a superset: 2 to 6 ladders done in rotation for a few rounds. Each athlete works their own rung of every ladder.
      </EmptyState>
    );
  }
  return (
    <ul className="grid gap-3 md:grid-cols-2">
      {blocks.data.items.map((block) => (
        <li key={block.id}>
          <Link href={`/coach/blocks/${block.id}`} className="block h-full">
            <Card className="h-full p-4 hover:border-moss">
              <div className="flex items-start justify-between gap-2">
                <p className="font-semibold">{block.name}</p>
                <Badge tone="sky">≈ {formatDuration(block.durationSec)}</Badge>
              </div>
              <p className="mt-1 text-sm text-muted">
                {block.rounds} {block.rounds === 1 ? "round" : "rounds"} · {block.slots.map((s) => s.ladderName).join(" → ")}
              </p>
              {block.warnings.length ? (
                <p className="mt-2">
                  <Badge tone="ember">{block.warnings.length === 1 ? "1 pairing warning" : `${block.warnings.length} pairing warnings`}</Badge>
                </p>
              ) : null}
            </Card>
          </Link>
        </li>
      ))}
    </ul>
  );
}
