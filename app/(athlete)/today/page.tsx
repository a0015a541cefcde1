import type { Metadata } from "next";
import { Card, EmptyState } from "@/components/ui/card";
import { requirePageActor } from "@/lib/server/auth/page-actor";

export const metadata: Metadata = { title: "Today" };

export default async function TodayPage() {
  const actor = await requirePageActor("athlete");
  const firstName = actor.name.split(" ")[0];
  return (
    <div className="flex flex-col gap-5">
      <h1 className="font-display text-3xl font-bold">Hi {firstName}</h1>
      <EmptyState title="Nothing planned for today">
        Your coach hasn't given you a plan for today yet. When they do, each rung you're on shows up here, ready to log.
      </EmptyState>
      <Card>
        <p className="font-semibold">Before you train</p>
        <ul className="mt-2 list-disc pl-5 text-sm text-muted">
          <li>Warm up wrists and shoulders for a few minutes.</li>
          <li>Use a wall or a spotter for any new inversion.</li>
          <li>Stop on sharp pain and flag it in your log: your coach sees it.</li>
        </ul>
      </Card>
    </div>
  );
}
