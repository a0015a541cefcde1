"use client";
"use no memo"; // react-table keeps mutable state the React Compiler must not memoise

import { keepPreviousData, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type VisibilityState } from "@tanstack/react-table";
import Link from "next/link";
import { useMemo, useState } from "react";
import { Button, buttonClass } from "@/components/ui/button";
import { EmptyState, Notice } from "@/components/ui/card";
import { cn } from "@/components/ui/cn";
import { Spinner } from "@/components/ui/spinner";
import { api, ApiError } from "@/lib/client/api";
import type { ReadinessPage, ReadinessRow } from "@/lib/validation/readiness";
import { ReadinessCellView } from "./readiness-cell";
import { ReadinessFilterBar, type Choice } from "./readiness-filters";
import { PAGE_SIZE, readinessParams, type ReadinessFilters } from "./readiness-params";
import { useGridKeys } from "./use-grid-keys";

interface LadderChoice extends Choice {
  placed: boolean;
}

/** The coach's weekly readiness table: server-side filters, sort and cursor paging; approve from a cell. */
export function ReadinessTable({ currentWeek, ladders, squads }: { currentWeek: string; ladders: LadderChoice[]; squads: Choice[] }) {
  const queryClient = useQueryClient();
  const [filters, setFilters] = useState<ReadinessFilters>({
    week: currentWeek,
    squad: "",
    ladder: "",
    status: "",
    stalledWeeks: 4,
    mine: false,
    sort: "name",
  });
  // Cursors of the pages before the current one, so "Previous" can go back.
  const [cursors, setCursors] = useState<string[]>([]);
  const cursor = cursors.at(-1) ?? "";
  const [visibility, setVisibility] = useState<VisibilityState>(() =>
    Object.fromEntries(ladders.map((l) => [l.id, l.placed])),
  );
  const [message, setMessage] = useState<{ tone: "moss" | "danger"; text: string } | null>(null);

  const params = readinessParams(filters, { limit: String(PAGE_SIZE), ...(cursor ? { cursor } : {}) });
  const queryKey = ["readiness", params.toString()];
  const query = useQuery({
    queryKey,
    queryFn: () => api<ReadinessPage>(`/api/v1/readiness?${params}`),
    placeholderData: keepPreviousData,
  });

  const approve = useMutation({
    mutationFn: (promotionId: string) => api(`/api/v1/promotions/${promotionId}/approve`, { method: "POST" }),
    onMutate: async (promotionId) => {
      setMessage(null);
      await queryClient.cancelQueries({ queryKey });
      const before = queryClient.getQueryData<ReadinessPage>(queryKey);
      if (before) {
        queryClient.setQueryData<ReadinessPage>(queryKey, {
          ...before,
          items: before.items.map((row) => ({
            ...row,
            ladders: row.ladders.map((c) => (c.pendingPromotionId === promotionId ? { ...c, pendingPromotionId: null, status: "met" } : c)),
          })),
        });
      }
      return { before };
    },
    onError: (error, _id, context) => {
      if (context?.before) queryClient.setQueryData(queryKey, context.before);
      setMessage({ tone: "danger", text: error instanceof ApiError ? error.message : "The approval did not go through. Try again." });
    },
    onSuccess: () => setMessage({ tone: "moss", text: "Promotion approved." }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: ["readiness"] }),
  });

  const shown = filters.ladder ? ladders.filter((l) => l.id === filters.ladder) : ladders;
  const columns = useMemo<ColumnDef<ReadinessRow>[]>(
    () => [
      {
        id: "athlete",
        header: "Athlete",
        enableHiding: false,
        accessorFn: (row) => row.athleteName,
        cell: ({ row }) => (
          <Link href={`/coach/athletes/${row.original.athleteId}/progress`} className="font-semibold text-ink hover:text-moss hover:underline">
            {row.original.athleteName}
          </Link>
        ),
      },
      ...shown.map(
        (ladder): ColumnDef<ReadinessRow> => ({
          id: ladder.id,
          header: ladder.name,
          accessorFn: (row) => row.ladders.find((c) => c.ladderId === ladder.id) ?? null,
          cell: ({ row }) => {
            const cell = row.original.ladders.find((c) => c.ladderId === ladder.id);
            return cell ? (
              <ReadinessCellView
                cell={cell}
                athleteName={row.original.athleteName}
                approving={approve.isPending && approve.variables === cell.pendingPromotionId}
                onApprove={(id) => approve.mutate(id)}
              />
            ) : (
              <span className="text-xs text-muted">Not placed</span>
            );
          },
        }),
      ),
    ],
    [shown, approve],
  );

  // eslint-disable-next-line react-hooks/incompatible-library -- the component opts out of the compiler ("use no memo")
  const table = useReactTable({
    data: query.data?.items ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualFiltering: true,
    manualPagination: true,
    state: { columnVisibility: visibility },
    onColumnVisibilityChange: setVisibility,
    getRowId: (row) => row.athleteId,
  });
  const rows = table.getRowModel().rows;
  const visibleColumns = table.getVisibleLeafColumns();
  const grid = useGridKeys(rows.length + 1, visibleColumns.length);

  const change = (next: Partial<ReadinessFilters>) => {
    setFilters((f) => ({ ...f, ...next }));
    setCursors([]);
  };
  const csvHref = `/api/v1/readiness?${readinessParams(filters, { format: "csv" })}`;

  return (
    <div className="flex flex-col gap-4">
      <ReadinessFilterBar filters={filters} squads={squads} ladders={ladders} onChange={change} />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <details className="text-sm">
          <summary className="cursor-pointer font-semibold text-moss">Columns</summary>
          <div className="mt-2 flex flex-wrap gap-3">
            {table
              .getAllLeafColumns()
              .filter((c) => c.getCanHide())
              .map((column) => (
                <label key={column.id} className="flex items-center gap-1.5">
                  <input type="checkbox" checked={column.getIsVisible()} onChange={column.getToggleVisibilityHandler()} className="h-4 w-4" />
                  {String(column.columnDef.header)}
                </label>
              ))}
          </div>
        </details>
        <a href={csvHref} download className={buttonClass("secondary", "sm")}>
          Download CSV
        </a>
      </div>
      <p className="text-xs text-muted">
        Week {query.data?.week ?? filters.week}
        {query.data ? ` (${query.data.weekStart} – ${query.data.weekEnd})` : ""}, in your team&apos;s time zone. Keyboard: arrow keys move
        between cells, Home/End jump along a row, Enter opens the athlete or approves.
      </p>
      {message ? <Notice tone={message.tone}>{message.text}</Notice> : null}
      {query.isPending ? <Spinner label="Loading the week" /> : null}
      {query.isError ? (
        <Notice tone="danger">{query.error instanceof ApiError ? query.error.message : "Couldn't load the table. Try again in a moment."}</Notice>
      ) : null}
      {query.isSuccess && rows.length === 0 ? (
        <EmptyState title="No athletes match">
          {filters.status || filters.squad || filters.ladder || filters.mine
            ? "Loosen a filter to see more of the team."
            : "Add athletes and place them on ladders; their week shows up here."}
        </EmptyState>
      ) : null}
      {rows.length > 0 ? (
        <div className={cn("overflow-x-auto rounded-card border border-line bg-surface", query.isFetching && "opacity-70")}>
          <table role="grid" aria-label="Readiness this week" className="w-full border-collapse text-left" onKeyDown={grid.onKeyDown}>
            <thead>
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id}>
                  {group.headers.map((header, c) => (
                    <th
                      key={header.id}
                      scope="col"
                      {...grid.cellProps(0, c)}
                      className={cn(
                        "border-b border-line bg-sunken px-3 py-2 text-xs font-semibold uppercase tracking-wide text-muted focus:outline-2 focus:outline-moss",
                        c === 0 && "sticky left-0 z-10",
                      )}
                    >
                      {flexRender(header.column.columnDef.header, header.getContext())}
                    </th>
                  ))}
                </tr>
              ))}
            </thead>
            <tbody>
              {rows.map((row, r) => (
                <tr key={row.id} className="border-b border-line last:border-0">
                  {row.getVisibleCells().map((cell, c) => (
                    <td
                      key={cell.id}
                      {...grid.cellProps(r + 1, c)}
                      className={cn(
                        "px-3 py-3 align-top focus:outline-2 focus:-outline-offset-2 focus:outline-moss",
                        c === 0 && "sticky left-0 z-10 min-w-40 bg-surface shadow-[1px_0_0_var(--line)]",
                      )}
                    >
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
      <div className="flex gap-2">
        <Button variant="secondary" disabled={cursors.length === 0} onClick={() => setCursors((c) => c.slice(0, -1))}>
          Previous page
        </Button>
        <Button
          variant="secondary"
          disabled={!query.data?.nextCursor}
          onClick={() => query.data?.nextCursor && setCursors((c) => [...c, query.data.nextCursor!])}
        >
          Next page
        </Button>
      </div>
    </div>
  );
}
