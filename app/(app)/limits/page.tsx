import { listPeriods } from "@/db/periods";
import { loadPeriodsTotals } from "@/db/exposure";
import { listCountings } from "@/db/limits";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { ExposureInputError, type PeriodTotals } from "@/lib/exposure";
import { DEFAULT_CL } from "@/lib/limits-view";
import { EmptyState } from "@/components/ui/EmptyState";
import { LimitsBoard } from "@/components/limits/LimitsBoard";
import { periodLimitQuerySchema } from "@/components/limits/inputs";
import { limitRow } from "@/components/limits/rows";
import { recordCountingAction } from "./actions";

export const metadata = { title: "Limits" };
export const dynamic = "force-dynamic";

export default async function LimitsPage({ searchParams }: { searchParams: Promise<{ method?: string; cl?: string }> }) {
  const user = await requireRole("periods.read");
  const canRecord = rolesAllow(user.roles, "limits.record");
  const query = await searchParams;
  const chosen = periodLimitQuerySchema.safeParse({ method: query.method || undefined, cl: query.cl || undefined });
  const [periods, countings] = await Promise.all([listPeriods(), listCountings()]);
  let totals = new Map<number, PeriodTotals>();
  let problem: string | null = null;
  try {
    totals = await loadPeriodsTotals(periods);
  } catch (err) {
    if (!(err instanceof ExposureInputError)) throw err;
    problem = err.message;
  }
  // Built on the server with the count already withheld for blind periods.
  const rows = periods.map((p) => limitRow(p, countings.get(p.id), totals.get(p.id)));
  return (
    <section className="space-y-4">
      <div>
        <h1 className="text-xl font-semibold">Limits</h1>
        <p className="text-sm text-muted">
          Per data-quality period and combined: the interval on the signal mean μ from the observed count n and expected background b, and the
          rate limit rate_up = μ_up / (acceptance × exposure) in events/(kg·day) and events/(t·yr) (1 t·yr = 365 250 kg·day). Exposure comes from the
          exposure ledger. The combination sums n, b and acceptance × exposure over the periods that are not blind and have n recorded.
        </p>
      </div>
      {!chosen.success && (
        <p role="alert" className="rounded border border-warn/60 bg-warn/10 p-3 text-sm">
          <span aria-hidden>⚠ </span>The address asks for a method or CL that cannot be used ({chosen.error.issues[0]?.message}); showing Feldman–Cousins at 90 % CL.
        </p>
      )}
      {problem && (
        <p role="alert" className="rounded border border-bad/60 bg-bad/10 p-3 text-sm">
          <span aria-hidden>⚠ </span>Exposure cannot be computed, so no rates are shown: {problem}
        </p>
      )}
      {rows.length === 0 ? (
        <EmptyState title="No data-quality periods yet.">
          Limits are set per period. An analysis convener first defines a period on the Exposure page; its count and background are then recorded here.
        </EmptyState>
      ) : (
        <LimitsBoard
          rows={rows}
          initialMethod={(chosen.success && chosen.data.method) || "fc"}
          initialCl={(chosen.success && chosen.data.cl) || DEFAULT_CL}
          canRecord={canRecord}
          recordAction={recordCountingAction}
        />
      )}
    </section>
  );
}
