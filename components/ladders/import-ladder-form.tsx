"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, Notice } from "@/components/ui/card";
import { api, ApiError } from "@/lib/client/api";
import type { LadderDto } from "@/lib/validation/ladders";

interface Problem {
  path: string;
  message: string;
}

/** Upload of a ladder file exported from Rungwise; every problem is listed with where it is. */
export function ImportLadderForm() {
  const id = useId();
  const router = useRouter();
  const queryClient = useQueryClient();
  const [file, setFile] = useState<File | null>(null);
  const [failure, setFailure] = useState<{ message: string; problems: Problem[] } | null>(null);
  const upload = useMutation({
    mutationFn: async (chosen: File) => {
      let doc: unknown;
      try {
        doc = JSON.parse(await chosen.text());
      } catch {
        throw new ApiError(400, "bad_request", "This file is not JSON. Choose a ladder file exported from Rungwise.");
      }
      return api<{ ladder: LadderDto; warnings: Problem[] }>("/api/v1/ladders/import", { method: "POST", json: doc });
    },
    onSuccess: ({ ladder, warnings }) => {
      void queryClient.invalidateQueries({ queryKey: ["ladders"] });
      const note = warnings.length ? `?imported=${encodeURIComponent(warnings.map((w) => w.message).join("\n"))}` : "?imported=";
      router.push(`/coach/ladders/${ladder.id}${note}`);
    },
    onError: (e) =>
      setFailure(
        e instanceof ApiError
          ? { message: e.message, problems: e.issues }
          : { message: "Something went wrong. Check your connection and try again.", problems: [] },
      ),
  });
  return (
    <Card>
      <h2 className="mb-2 font-display text-lg font-bold">Import a ladder</h2>
      <p className="mb-4 text-sm text-muted">A ladder file (.json) exported from Rungwise. A file with problems changes nothing.</p>
      <form
        className="flex flex-col gap-4"
        onSubmit={(e) => {
          e.preventDefault();
          setFailure(null);
          if (file) upload.mutate(file);
          else setFailure({ message: "Choose a file first.", problems: [] });
        }}
      >
        <div className="flex flex-col gap-1.5">
          <label htmlFor={id} className="text-sm font-semibold">
            Ladder file
          </label>
          <input
            id={id}
            type="file"
            accept="application/json,.json"
            className="text-sm"
            onChange={(e) => setFile(e.target.files?.[0] ?? null)}
            aria-describedby={failure ? `${id}-problems` : undefined}
          />
        </div>
        {failure ? (
          <div id={`${id}-problems`} role="alert">
            <Notice tone="danger">
              <p className="font-semibold">{failure.message}</p>
              {failure.problems.length ? (
                <ul className="mt-2 list-disc pl-4">
                  {failure.problems.map((p) => (
                    <li key={`${p.path}:${p.message}`}>
                      <code className="font-mono text-xs">{p.path}</code>: {p.message}
                    </li>
                  ))}
                </ul>
              ) : null}
            </Notice>
          </div>
        ) : null}
        <Button type="submit" variant="secondary" disabled={upload.isPending}>
          {upload.isPending ? "Importing…" : "Import"}
        </Button>
      </form>
    </Card>
  );
}
