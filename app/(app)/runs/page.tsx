import { suggestNextRunNumber } from "@/db/runs";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { RunsTable } from "@/components/runs/RunsTable";
import { RunsTabs } from "@/components/runs/RunsTabs";
import { OpenRunForm } from "./OpenRunForm";

export const metadata = { title: "Runs" };
export const dynamic = "force-dynamic";

export default async function RunsPage() {
  const user = await requireRole("runs.read");
  const canWrite = rolesAllow(user.roles, "runs.write");
  return (
    <section>
      <h1 className="mb-3 text-xl font-semibold">Runs</h1>
      <RunsTabs current="/runs" />
      {canWrite && (
        <details className="mb-4 rounded-lg border border-line bg-panel p-3">
          <summary className="cursor-pointer text-sm font-medium">Open a run</summary>
          <p className="mb-3 mt-1 text-xs text-muted">
            Normally the DAQ opens and closes runs itself. Use this when a run is started by hand; it is checked exactly as the DAQ&apos;s are.
          </p>
          <OpenRunForm suggestedNumber={await suggestNextRunNumber()} nowUtc={new Date().toISOString().slice(0, 19)} />
        </details>
      )}
      <RunsTable />
    </section>
  );
}
