"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { FieldFrame, SelectField } from "@/components/ui/field";
import { api, ApiError, applyIssues } from "@/lib/client/api";
import { capturePosterFrame } from "@/lib/client/poster-frame";
import { putWithProgress } from "@/lib/client/put-with-progress";
import {
  isVideoType,
  MEDIA_TYPES,
  ZCreateFormCheck,
  type FormCheckDetailDto,
  type MediaType,
  type UploadTicket,
} from "@/lib/validation/form-checks";

const ZDraft = ZCreateFormCheck.pick({ note: true, athleteId: true });
type DraftIn = z.input<typeof ZDraft>;
type DraftOut = z.output<typeof ZDraft>;

type Step =
  | { name: "idle" }
  | { name: "preparing" }
  | { name: "uploading"; progress: number; retry?: string }
  | { name: "checking" }
  | { name: "saving" };

const STEP_TEXT: Record<Exclude<Step["name"], "idle" | "uploading">, string> = {
  preparing: "Preparing…",
  checking: "Checking the file…",
  saving: "Saving…",
};

/**
 * Picks a video or photo, uploads it straight to storage with a progress bar (retrying dropped
 * connections), then creates the form check. Staff choose the athlete; athletes upload their own.
 */
export function FormCheckUploader({ athletes, basePath }: { athletes?: { id: string; name: string }[]; basePath: string }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | undefined>();
  const [step, setStep] = useState<Step>({ name: "idle" });
  const [failure, setFailure] = useState<string | null>(null);
  const form = useForm<DraftIn, unknown, DraftOut>({ resolver: zodResolver(ZDraft), defaultValues: { note: "" } });
  const busy = step.name !== "idle";

  function choose(picked: File | undefined) {
    setFailure(null);
    setFileError(undefined);
    if (!picked) return setFile(null);
    if (!(MEDIA_TYPES as readonly string[]).includes(picked.type)) {
      setFile(null);
      return setFileError("Choose a video (MP4, MOV or WebM) or a photo (JPEG, PNG or HEIC).");
    }
    setFile(picked);
  }

  async function send(values: DraftOut) {
    if (!file) return setFileError("Choose a video or photo first.");
    if (athletes && !values.athleteId) return form.setError("athleteId", { message: "Choose the athlete." });
    setFailure(null);
    try {
      setStep({ name: "preparing" });
      const contentType = file.type as MediaType;
      const poster = isVideoType(contentType) ? await capturePosterFrame(file) : null;
      const ticket = await api<UploadTicket>("/api/v1/uploads", {
        method: "POST",
        json: { contentType, size: file.size, purpose: "form_check", fileName: file.name, athleteId: values.athleteId },
      });
      setStep({ name: "uploading", progress: 0 });
      await putWithProgress(ticket.url, file, {
        headers: ticket.headers,
        onProgress: (progress) => setStep({ name: "uploading", progress }),
        onRetry: (attempt, waitMs) =>
          setStep({ name: "uploading", progress: 0, retry: `Connection dropped; trying again in ${waitMs / 1000} s (attempt ${attempt + 1}).` }),
      });
      setStep({ name: "checking" });
      await api(`/api/v1/uploads/${ticket.uploadId}/complete`, { method: "POST" });
      setStep({ name: "saving" });
      const created = await api<FormCheckDetailDto>("/api/v1/form-checks", {
        method: "POST",
        json: { uploadId: ticket.uploadId, athleteId: values.athleteId, note: values.note || undefined, poster: poster ?? undefined },
      });
      await queryClient.invalidateQueries({ queryKey: ["form-checks"] });
      router.push(`${basePath}/${created.id}`);
    } catch (error) {
      setStep({ name: "idle" });
      if (error instanceof ApiError && error.issues.some((i) => i.path === "size" || i.path === "contentType")) {
        setFileError(error.message);
      } else if (error instanceof ApiError && error.status === 413) {
        setFileError(error.message);
      } else {
        setFailure(error instanceof ApiError ? applyIssues(error, form.setError) : error instanceof Error ? error.message : String(error));
      }
    }
  }

  return (
    <Card>
      <h2 className="mb-1 font-display text-lg font-bold">Send a form check</h2>
      <p className="mb-4 text-sm text-muted">
        A short clip of one set is plenty. Film from the side, whole body in frame. Use a wall or a spotter for new inversions.
      </p>
      <form onSubmit={form.handleSubmit(send)} className="flex flex-col gap-4" noValidate>
        {failure ? <Notice tone="danger">{failure}</Notice> : null}
        {athletes ? (
          <SelectField label="Athlete" error={form.formState.errors.athleteId?.message} {...form.register("athleteId", { setValueAs: (v: string) => v || undefined })}>
            <option value="">Choose…</option>
            {athletes.map((a) => (
              <option key={a.id} value={a.id}>
                {a.name}
              </option>
            ))}
          </SelectField>
        ) : null}
        <FieldFrame label="Video or photo" id="form-check-file" error={fileError} hint="Videos up to 200 MB, photos up to 15 MB.">
          <input
            id="form-check-file"
            type="file"
            accept={MEDIA_TYPES.join(",")}
            disabled={busy}
            aria-invalid={fileError ? true : undefined}
            onChange={(e) => choose(e.target.files?.[0])}
            className="block w-full rounded-lg border border-line bg-surface p-3 text-sm file:mr-3 file:h-10 file:rounded-lg file:border-0 file:bg-sunken file:px-4 file:font-semibold"
          />
        </FieldFrame>
        <FieldFrame label="Note for your coach (optional)" id="form-check-note" error={form.formState.errors.note?.message}>
          <textarea
            id="form-check-note"
            rows={2}
            disabled={busy}
            className="w-full rounded-lg border border-line bg-surface px-3 py-2 text-ink focus:border-moss focus:outline-none"
            {...form.register("note")}
          />
        </FieldFrame>
        {step.name === "uploading" ? (
          <div className="flex flex-col gap-1">
            <div
              role="progressbar"
              aria-label="Upload progress"
              aria-valuemin={0}
              aria-valuemax={100}
              aria-valuenow={Math.round(step.progress * 100)}
              className="h-3 overflow-hidden rounded-full bg-sunken"
            >
              <div className="h-full bg-moss transition-[width]" style={{ width: `${Math.round(step.progress * 100)}%` }} />
            </div>
            <p className="text-sm text-muted">{step.retry ?? `Uploading… ${Math.round(step.progress * 100)} %`}</p>
          </div>
        ) : busy ? (
          <p className="text-sm text-muted" role="status">
            {STEP_TEXT[step.name]}
          </p>
        ) : null}
        <Button type="submit" size="lg" disabled={busy}>
          {busy ? "Sending…" : "Send for review"}
        </Button>
      </form>
    </Card>
  );
}
