"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { Badge, Card, EmptyState, Notice } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { api } from "@/lib/client/api";
import { formatMoment, type FormCheckDetailDto } from "@/lib/validation/form-checks";
import { CommentForm } from "./comment-form";
import { DeleteFormCheck } from "./delete-form-check";
import { PlayerControls } from "./player-controls";

/**
 * The review screen: the video (or photo) through its short-lived signed URL, playback speed and
 * frame steps, and comments pinned to moments. A click on a comment jumps the video there.
 */
export function FormCheckReview({ id, canComment, backHref }: { id: string; canComment: boolean; backHref: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const video = useRef<HTMLVideoElement>(null);
  const [now, setNow] = useState(0);
  // The signed URL is fixed once playing; a fresh one is fetched only when the old one stops working.
  const [src, setSrc] = useState<string | null>(null);
  const query = useQuery({
    queryKey: ["form-check", id],
    queryFn: () => api<FormCheckDetailDto>(`/api/v1/form-checks/${id}`),
  });
  const check = query.data;
  // Adopt the first URL during render (no effect needed); later refetches keep the playing one.
  if (check && src === null) setSrc(check.mediaUrl);

  const renew = useMutation({
    mutationFn: () => query.refetch(),
    onSuccess: (result) => {
      if (result.data && result.data.mediaUrl !== src) {
        const at = video.current?.currentTime ?? 0;
        setSrc(result.data.mediaUrl);
        requestAnimationFrame(() => video.current && (video.current.currentTime = at));
      }
    },
  });

  function changeSpeed(rate: number) {
    if (video.current) video.current.playbackRate = rate;
  }

  function step(delta: number) {
    const player = video.current;
    if (!player) return;
    player.pause();
    const end = Number.isFinite(player.duration) ? player.duration : Number.MAX_SAFE_INTEGER;
    jumpTo(Math.min(end, Math.max(0, player.currentTime + delta)));
  }

  function jumpTo(seconds: number) {
    const player = video.current;
    if (!player) return;
    player.pause();
    player.currentTime = seconds;
    setNow(seconds);
  }

  if (query.isPending) return <Spinner label="Loading the form check" />;
  if (query.isError || !check) {
    return (
      <EmptyState title="This form check is not available">
        It may have been deleted, or it belongs to someone else.
      </EmptyState>
    );
  }

  const isVideo = check.kind === "video";
  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_360px]">
      <section aria-label="Player" className="flex flex-col gap-3">
        {isVideo ? (
          <>
            <video
              ref={video}
              src={src ?? undefined}
              poster={check.poster ?? undefined}
              controls
              playsInline
              preload="auto"
              className="aspect-video w-full rounded-card bg-ink"
              onTimeUpdate={(e) => setNow(e.currentTarget.currentTime)}
              onSeeked={(e) => setNow(e.currentTarget.currentTime)}
              onError={() => !renew.isPending && renew.mutate()}
            />
            <PlayerControls now={now} onSpeed={changeSpeed} onStep={step} />
          </>
        ) : src ? (
          // eslint-disable-next-line @next/next/no-img-element -- a signed, short-lived URL; the optimiser cannot fetch it
          <img src={src} alt={check.note ?? "Form check photo"} className="w-full rounded-card bg-sunken object-contain" />
        ) : null}
        <div className="flex flex-wrap items-center gap-2 text-sm text-muted">
          <span className="font-semibold text-ink">{check.athleteName}</span>
          {check.rungName ? <Badge tone="sky">{check.rungName}</Badge> : null}
          <span>{new Date(check.createdAt).toLocaleString()}</span>
        </div>
        {check.note ? <p className="rounded-lg bg-sunken px-3 py-2 text-sm">{check.note}</p> : null}
      </section>

      <aside aria-label="Comments" className="flex flex-col gap-3">
        <Card className="flex flex-col gap-3">
          <h2 className="font-display text-lg font-bold">Comments</h2>
          {check.comments.length === 0 ? (
            <p className="text-sm text-muted">{canComment ? "No comments yet. Pause on a moment and comment on it." : "Your coach hasn't commented yet."}</p>
          ) : (
            <ol className="flex flex-col gap-2">
              {check.comments.map((comment) => (
                <li key={comment.id}>
                  <button
                    type="button"
                    onClick={() => jumpTo(comment.atSeconds)}
                    disabled={!isVideo}
                    className="flex w-full gap-3 rounded-lg border border-line p-3 text-left hover:border-moss disabled:hover:border-line"
                  >
                    {isVideo ? <span className="font-mono text-sm font-semibold text-moss">{formatMoment(comment.atSeconds)}</span> : null}
                    <span className="flex-1">
                      <span className="block text-sm">{comment.body}</span>
                      <span className="block text-xs text-muted">{comment.authorName ?? "Former staff"}</span>
                    </span>
                  </button>
                </li>
              ))}
            </ol>
          )}
          {canComment ? (
            <CommentForm
              formCheckId={check.id}
              at={isVideo ? now : 0}
              showMoment={isVideo}
              onAdded={() => void queryClient.invalidateQueries({ queryKey: ["form-check", id] })}
            />
          ) : null}
        </Card>
        <Notice tone="neutral">Comments are advice on form, not a diagnosis. Stop on sharp pain and see a qualified professional.</Notice>
        <DeleteFormCheck
          formCheckId={check.id}
          onDeleted={() => {
            void queryClient.invalidateQueries({ queryKey: ["form-checks"] });
            router.push(backHref);
          }}
        />
      </aside>
    </div>
  );
}
