"use client";
/**
 * The runs table: fetched from GET /api/runs with SWR, newest first, keyset-paged ("Older runs" / "Newer runs"),
 * sortable within the page, filtered by type, status and date. It refreshes by itself, every 5 s while a run is open.
 */
import { useState } from "react";
import useSWR from "swr";
import { flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { Badge } from "@/components/ui/Badge";
import { EmptyState } from "@/components/ui/EmptyState";
import type { RunPage } from "@/db/runs";
import { RUN_COLUMNS } from "./run-columns";
import { filterParams, NO_FILTERS, RunFilters, type RunFilterValues } from "./RunFilters";

/** Refresh period while any run is open. */
export const LIVE_REFRESH_MS = 5_000;
/** Refresh period otherwise, so a run the DAQ opens still shows up soon. */
export const IDLE_REFRESH_MS = 30_000;

async function fetchPage(url: string): Promise<RunPage> {
  const res = await fetch(url, { headers: { accept: "application/json" } });
  const body = (await res.json().catch(() => ({}))) as RunPage & { error?: string };
  if (!res.ok) throw new Error(body.error ?? `the server answered ${res.status}`);
  return body;
}

const ARIA_SORT = { asc: "ascending", desc: "descending" } as const;

/** The live runs table. */
export function RunsTable({ pageSize = 50 }: { pageSize?: number }) {
  const [filters, setFilters] = useState<RunFilterValues>(NO_FILTERS);
  const [cursors, setCursors] = useState<string[]>([]);
  const [sorting, setSorting] = useState<SortingState>([]);
  const cursor = cursors[cursors.length - 1];
  const params = filterParams(filters);
  params.set("limit", String(pageSize));
  if (cursor) params.set("cursor", cursor);
  const { data, error, isLoading, isValidating } = useSWR(`/api/runs?${params}`, fetchPage, {
    refreshInterval: (latest) => (latest && latest.openRuns > 0 ? LIVE_REFRESH_MS : IDLE_REFRESH_MS),
    keepPreviousData: true,
  });
  const table = useReactTable({
    data: data?.runs ?? [],
    columns: RUN_COLUMNS,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const filtered = Object.values(filters).some(Boolean);
  const changeFilters = (f: RunFilterValues) => {
    setFilters(f);
    setCursors([]);
  };

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <RunFilters value={filters} onChange={changeFilters} />
        <div className="flex items-center gap-3 text-xs text-muted" aria-live="polite">
          {data && data.openRuns > 0 ? (
            <span data-testid="live-indicator">
              <Badge tone="accent" icon="●">live</Badge>{" "}
              {data.openRuns} open · refreshing every {LIVE_REFRESH_MS / 1000} s
            </span>
          ) : (
            data && <span>No run open · refreshing every {IDLE_REFRESH_MS / 1000} s</span>
          )}
          {isValidating && <span role="status">Refreshing…</span>}
        </div>
      </div>
      {error && (
        <p role="alert" className="mb-3 text-sm text-bad">
          ⚠ Could not load runs: {error instanceof Error ? error.message : String(error)}. Retrying…
        </p>
      )}
      {isLoading && !data ? (
        <p role="status" className="py-8 text-center text-sm text-muted">Loading runs…</p>
      ) : data && data.runs.length === 0 ? (
        <EmptyState title={filtered ? "No runs match these filters" : "No runs recorded yet"}>
          {filtered
            ? "Widen the date range or clear the filters."
            : "The DAQ opens runs through POST /api/runs with a machine token (an admin creates one under Admin → Machine tokens); shift crew can open one with “Open a run” above."}
        </EmptyState>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-line bg-panel">
          <table className="w-full text-sm" aria-label="Runs">
            <thead className="bg-raised/50 text-left text-xs text-muted">
              {table.getHeaderGroups().map((hg) => (
                <tr key={hg.id}>
                  {hg.headers.map((h) => {
                    const sorted = h.column.getIsSorted();
                    return (
                      <th key={h.id} className="whitespace-nowrap px-2 py-1.5 font-medium" aria-sort={sorted ? ARIA_SORT[sorted] : undefined}>
                        {h.column.getCanSort() ? (
                          <button type="button" onClick={h.column.getToggleSortingHandler()} className="hover:text-ink" title="Sort within this page">
                            {flexRender(h.column.columnDef.header, h.getContext())}
                            <span aria-hidden className="ml-1">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                          </button>
                        ) : (
                          flexRender(h.column.columnDef.header, h.getContext())
                        )}
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {table.getRowModel().rows.map((row) => (
                <tr key={row.id} data-testid="run-row" data-run-type={row.original.type} className="border-t border-line hover:bg-raised/40">
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className="whitespace-nowrap px-2 py-1">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
      <nav aria-label="Pages of runs" className="mt-3 flex items-center gap-2 text-sm">
        <button
          type="button"
          disabled={cursors.length === 0}
          onClick={() => setCursors((c) => c.slice(0, -1))}
          className="rounded border border-line px-3 py-1 hover:bg-raised disabled:opacity-40"
        >
          ← Newer runs
        </button>
        <button
          type="button"
          disabled={!data?.nextCursor}
          onClick={() => data?.nextCursor && setCursors((c) => [...c, data.nextCursor as string])}
          className="rounded border border-line px-3 py-1 hover:bg-raised disabled:opacity-40"
        >
          Older runs →
        </button>
        <span className="text-xs text-muted">
          {cursors.length === 0 ? "Newest runs" : `Page ${cursors.length + 1}`} · {pageSize} a page · sorting applies within the page
        </span>
      </nav>
    </div>
  );
}
