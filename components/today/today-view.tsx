"use client";

import { useQuery } from "@tanstack/react-query";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, EmptyState, Notice } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import type { PendingSet } from "@/lib/client/offline-queue";
import type { TodayEndpoints } from "@/lib/client/send-pending";
import type { TodayDto, TodayRung } from "@/lib/validation/logs";
import { FinishSession } from "./finish-session";
import { RungCard } from "./rung-card";
import type { SetSubmission } from "./set-form";
import { usePendingWrites } from "./use-pending-writes";

const DEFAULT_REST_SEC = 90; // common practice, no source

/** The athlete's own day (`athleteId` omitted) or, for staff, any athlete's day. */
export function TodayView({ athleteId, title }: { athleteId?: string; title?: string }) {
  const url = athleteId ? `/api/v1/athletes/${athleteId}/today` : "/api/v1/me/today";
  const todayKey = useMemo(() => ["today", athleteId ?? "me"], [athleteId]);
  const endpoints = useMemo<TodayEndpoints>(() => ({ today: (date) => `${url}?date=${date}` }), [url]);
  const day = useQuery({ queryKey: todayKey, queryFn: () => api<TodayDto>(url), retry: 1 });
  const { pending, queue, discard } = usePendingWrites(day.data?.athleteId, endpoints, todayKey);
  const [showAll, setShowAll] = useState(false);

  if (day.isPending) return <Spinner label="Loading your day" />;
  if (day.isError || !day.data) {
    return <Notice tone="danger">Could not load the day. Check your connection; sets you log are kept on this device until they are sent.</Notice>;
  }
  const data = day.data;

  function logSet(rung: TodayRung, submission: SetSubmission) {
    queue({
      kind: "set",
      athleteId: data.athleteId,
      performedOn: data.date,
      rungId: rung.rungId,
      set: submission.set,
      pain: submission.pain,
      note: submission.note,
    });
  }

  const pendingSets = pending.filter((w): w is PendingSet => w.kind === "set" && w.performedOn === data.date);
  const unsent = pending.filter((w) => !w.error).length;
  const card = (rung: TodayRung, extra: { note?: string | null; target?: string | null; rest?: number; key: string }) => (
    <RungCard
      key={extra.key}
      rung={rung}
      slotNote={extra.note}
      target={extra.target}
      restSeconds={extra.rest ?? DEFAULT_REST_SEC}
      pending={pendingSets.filter((p) => p.rungId === rung.rungId)}
      onLog={(s) => logSet(rung, s)}
      onDiscard={(key) => void discard(key)}
    />
  );
  const loggedAny = data.logs.length > 0 || pendingSets.length > 0;

  return (
    <div className="flex flex-col gap-5">
      <header>
        <p className="text-sm text-muted">{new Date(`${data.date}T12:00:00Z`).toLocaleDateString(undefined, { weekday: "long", day: "numeric", month: "long", timeZone: "UTC" })}</p>
        <h1 className="font-display text-3xl font-bold">{title ?? data.athleteName}</h1>
      </header>
      {unsent > 0 ? (
        <Notice tone="ember">
          <span data-testid="pending-count">{unsent}</span> {unsent === 1 ? "write is" : "writes are"} waiting to be sent. They are kept on this device and go out as soon as the connection is back.
        </Notice>
      ) : null}
      <Card>
        <p className="font-semibold">Before you start</p>
        <p className="mt-1 text-sm text-muted">
          Warm up wrists and shoulders, use a wall or a spotter for inversions, and stop on sharp pain (flag it: your coach sees it). Rungwise does not replace a qualified coach or clinician.
        </p>
      </Card>
      {data.blocks.length === 0 ? (
        <EmptyState title="Nothing planned for today">
          {data.positions.length > 0 ? "You can still log any rung you are on." : "Your coach has not placed you on a ladder yet."}
        </EmptyState>
      ) : (
        data.blocks.map((block) => (
          <section key={block.id} className="flex flex-col gap-3">
            <h2 className="font-display text-xl font-bold">
              {block.name} <span className="text-sm font-normal text-muted">· {block.rounds} rounds</span>
            </h2>
            {block.slots.map((slot, i) =>
              slot.rung ? (
                card(slot.rung, { key: `${block.id}-${i}`, note: slot.note, target: slot.target, rest: block.restBetweenSlotsSec || block.restBetweenRoundsSec })
              ) : (
                <Notice key={`${block.id}-${i}`} tone="neutral">
                  {slot.ladderName}: not placed on this ladder yet — ask your coach.
                </Notice>
              ),
            )}
          </section>
        ))
      )}
      {data.positions.length > 0 ? (
        <section className="flex flex-col gap-3">
          <Button variant="secondary" size="lg" onClick={() => setShowAll((v) => !v)} aria-expanded={showAll}>
            {showAll ? "Hide other rungs" : "Log a rung anyway"}
          </Button>
          {showAll ? data.positions.map((rung) => card(rung, { key: `any-${rung.rungId}` })) : null}
        </section>
      ) : null}
      <FinishSession
        key={data.logs[0]?.id ?? "none"}
        canFinish={loggedAny}
        saved={data.logs[0] ?? null}
        onFinish={(values) =>
          queue({ kind: "finish", athleteId: data.athleteId, performedOn: data.date, ...values })
        }
      />
    </div>
  );
}
