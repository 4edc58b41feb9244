"use client";
/** Columns of the runs table (tanstack table v8). Sortable: number, start, duration, live time. */
import Link from "next/link";
import { createColumnHelper } from "@tanstack/react-table";
import { Time } from "@/components/ui/Time";
import type { RunListRow } from "@/db/run-views";
import { QualityBadge, StatusBadge } from "./RunBadges";
import { LiveFractionBar } from "./LiveFractionBar";
import { formatCount, formatDuration, formatMass, formatSeconds } from "./format";

const col = createColumnHelper<RunListRow>();

// Open runs have no duration or live time yet; they sort below every closed run either way.
const nullsLast = { sortUndefined: "last" as const, sortDescFirst: true };

/** The table's columns. */
export const RUN_COLUMNS = [
  col.accessor("number", {
    header: "Run",
    sortDescFirst: true,
    cell: (c) => (
      <Link href={`/runs/${c.getValue()}`} className="font-mono text-accent hover:underline">
        {c.getValue()}
      </Link>
    ),
  }),
  col.accessor("type", { header: "Type", enableSorting: false }),
  col.accessor("status", { header: "Status", enableSorting: false, cell: (c) => <StatusBadge status={c.getValue()} /> }),
  col.accessor("startMs", { header: "Start (UTC)", sortDescFirst: true, cell: (c) => <Time at={c.row.original.start} /> }),
  col.accessor((r) => r.durationSeconds ?? undefined, {
    id: "duration",
    header: "Duration",
    ...nullsLast,
    cell: (c) => <span className="tabular">{formatDuration(c.row.original.durationSeconds)}</span>,
  }),
  col.accessor((r) => r.liveSeconds ?? undefined, {
    id: "live",
    header: "Live time",
    ...nullsLast,
    cell: (c) => <span className="tabular">{formatSeconds(c.row.original.liveSeconds)}</span>,
  }),
  col.accessor("liveFraction", { header: "Live fraction", enableSorting: false, cell: (c) => <LiveFractionBar fraction={c.getValue()} /> }),
  col.accessor("triggerCount", { header: "Triggers", enableSorting: false, cell: (c) => <span className="tabular">{formatCount(c.getValue())}</span> }),
  col.accessor("targetMassKg", {
    header: "Target mass",
    enableSorting: false,
    cell: (c) => (
      <span className="tabular" title={c.row.original.targetMassSource === "override" ? "overridden for this run" : c.row.original.config.name}>
        {formatMass(c.getValue())}
        {c.row.original.targetMassSource === "override" && <span className="ml-1 text-warn">*</span>}
      </span>
    ),
  }),
  col.accessor((r) => r.config.name, { id: "config", header: "Configuration", enableSorting: false }),
  col.accessor("quality", { header: "Quality", enableSorting: false, cell: (c) => <QualityBadge quality={c.getValue()} /> }),
];
