"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Card, EmptyState, Notice } from "@/components/ui/card";
import { TextField } from "@/components/ui/field";
import { Spinner } from "@/components/ui/spinner";
import { api, ApiError } from "@/lib/client/api";
import type { Page } from "@/lib/validation/common";

interface TokenRow {
  id: string;
  name: string;
  prefix: string;
  lastUsedAt: string | null;
  createdAt: string;
}

/** Personal API tokens: create (shown once), list, revoke. */
export function ApiTokens() {
  const queryClient = useQueryClient();
  const [name, setName] = useState("");
  const [fresh, setFresh] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const tokens = useQuery({ queryKey: ["tokens"], queryFn: () => api<Page<TokenRow>>("/api/v1/tokens") });
  const create = useMutation({
    mutationFn: () => api<TokenRow & { token: string }>("/api/v1/tokens", { method: "POST", json: { name } }),
    onSuccess: (row) => {
      setFresh(row.token);
      setName("");
      setError(null);
      void queryClient.invalidateQueries({ queryKey: ["tokens"] });
    },
    onError: (e) => setError(e instanceof ApiError ? (e.issues[0]?.message ?? e.message) : "Could not create the token."),
  });
  const revoke = useMutation({
    mutationFn: (id: string) => api(`/api/v1/tokens/${id}`, { method: "DELETE" }),
    // Optimistic: the row disappears at once and comes back if the server says no.
    onMutate: async (id) => {
      await queryClient.cancelQueries({ queryKey: ["tokens"] });
      const before = queryClient.getQueryData<Page<TokenRow>>(["tokens"]);
      queryClient.setQueryData<Page<TokenRow>>(["tokens"], (page) =>
        page ? { ...page, items: page.items.filter((t) => t.id !== id) } : page,
      );
      return { before };
    },
    onError: (_e, _id, context) => queryClient.setQueryData(["tokens"], context?.before),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["tokens"] }),
  });

  return (
    <Card>
      <h2 className="font-display text-lg font-bold">API tokens</h2>
      <p className="mt-1 text-sm text-muted">
        For scripts and integrations: send <code className="font-mono">Authorization: Bearer &lt;token&gt;</code> to
        any <code className="font-mono">/api/v1</code> route. The API is described at{" "}
        <a className="font-semibold text-moss hover:underline" href="/api/v1/openapi.json">
          /api/v1/openapi.json
        </a>
        .
      </p>
      <form
        className="mt-4 flex flex-wrap items-end gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          create.mutate();
        }}
      >
        <div className="min-w-60 flex-1">
          <TextField label="Token name" value={name} onChange={(e) => setName(e.target.value)} error={error ?? undefined} />
        </div>
        <Button type="submit" disabled={create.isPending}>
          Create token
        </Button>
      </form>
      {fresh ? (
        <div className="mt-4">
          <Notice tone="ember">
            Copy this token now; it won't be shown again:
            <code className="mt-2 block break-all font-mono text-ink" data-testid="new-token">
              {fresh}
            </code>
          </Notice>
        </div>
      ) : null}
      <div className="mt-5">
        {tokens.isPending ? <Spinner /> : null}
        {tokens.data && tokens.data.items.length === 0 ? (
          <EmptyState title="No tokens yet">Create one for each script, so you can revoke them separately.</EmptyState>
        ) : null}
        <ul className="flex flex-col divide-y divide-line">
          {tokens.data?.items.map((token) => (
            <li key={token.id} className="flex items-center justify-between py-3">
              <div>
                <p className="font-semibold">{token.name}</p>
                <p className="font-mono text-xs text-muted">
                  {token.prefix}… · {token.lastUsedAt ? `last used ${new Date(token.lastUsedAt).toLocaleString()}` : "never used"}
                </p>
              </div>
              <Button variant="secondary" size="sm" onClick={() => revoke.mutate(token.id)}>
                Revoke
              </Button>
            </li>
          ))}
        </ul>
      </div>
    </Card>
  );
}
