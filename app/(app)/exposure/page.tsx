import Link from "next/link";
import { listPeriods } from "@/db/periods";
import { loadPeriodsTotals } from "@/db/exposure";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { ExposureInputError, type PeriodTotals } from "@/lib/exposure";
import { EmptyState } from "@/components/ui/EmptyState";
import { Time } from "@/components/ui/Time";
import { BlindBadge } from "@/components/exposure/BlindBadge";
import { EXPOSURE_FORMULA } from "@/components/exposure/report";
import { days, fixed, kgDay, tonneYear } from "@/components/exposure/format";

export const metadata = { title: "Exposure" };
export const dynamic = "force-dynamic";

export default async function ExposurePage() {
  const user = await requireRole("periods.read");
  const canManage = rolesAllow(user.roles, "periods.manage");
  const periods = await listPeriods();
  let totals = new Map<number, PeriodTotals>();
  let problem: string | null = null;
  try {
    totals = await loadPeriodsTotals(periods);
  } catch (err) {
    if (!(err instanceof ExposureInputError)) throw err;
    problem = err.message;
  }
  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-xl font-semibold">Exposure</h1>
          <p className="text-sm text-muted">
            Per data-quality period, from runs and confirmed excluding flags: exposure = {EXPOSURE_FORMULA} (kg·day; 1 t·yr = 365 250 kg·day).
          </p>
        </div>
        {canManage && (
          <Link href="/exposure/new" className="rounded bg-accent px-4 py-1.5 text-sm font-medium text-ground">New period</Link>
        )}
      </div>
      {problem && <p role="alert" className="rounded border border-bad/60 bg-bad/10 p-3 text-sm">⚠ Exposure cannot be computed: {problem}</p>}
      {periods.length === 0 ? (
        <EmptyState title="No data-quality periods yet.">
          {canManage ? "Define the first one with New period: a name, a UTC span and the run types that count." : "An analysis convener defines periods; their exposure appears here."}
        </EmptyState>
      ) : (
        <>
          <table className="w-full text-sm" aria-label="Data-quality periods">
            <thead className="text-left text-xs text-muted">
              <tr>
                <th className="py-1.5 pr-2">Period</th><th className="pr-2">Start (UTC)</th><th className="pr-2">End (UTC)</th><th className="pr-2">Run types</th>
                <th className="pr-2 text-right">Acceptance</th><th className="pr-2">Analysis</th><th className="pr-2 text-right">Runs</th>
                <th className="pr-2 text-right">Good live</th><th className="pr-2 text-right">Exposure</th><th className="pr-2 text-right">Exposure</th><th className="text-right">Open runs</th>
              </tr>
            </thead>
            <tbody className="tabular">
              {periods.map((p) => {
                const t = totals.get(p.id);
                return (
                  <tr key={p.id} className="border-t border-line" data-testid={`period-row-${p.id}`}>
                    <td className="py-1.5 pr-2"><Link href={`/exposure/${p.id}`} className="text-accent hover:underline">{p.name}</Link></td>
                    <td className="pr-2"><Time at={p.startAt} /></td>
                    <td className="pr-2"><Time at={p.endAt} /></td>
                    <td className="pr-2">{p.runTypes.join(", ")}</td>
                    <td className="pr-2 text-right">{fixed(p.signalAcceptance, 2)}</td>
                    <td className="pr-2"><BlindBadge blind={p.blind} /></td>
                    <td className="pr-2 text-right">{t ? t.runs : "—"}</td>
                    <td className="pr-2 text-right">{t ? days(t.goodLiveSeconds) : "—"}</td>
                    <td className="pr-2 text-right" data-value={t?.exposureKgDay}>{t ? kgDay(t.exposureKgDay) : "—"}</td>
                    <td className="pr-2 text-right">{t ? tonneYear(t.exposureTonneYear) : "—"}</td>
                    <td className="text-right">{t ? t.openRuns : "—"}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
          {periods.length >= 2 && (
            <form action="/exposure/compare" className="flex flex-wrap items-end gap-2 rounded-lg border border-line bg-panel p-3" aria-label="Compare two periods">
              <label className="text-xs text-muted">
                First period
                <select name="a" defaultValue={periods[0]!.id} className="mt-1 block rounded border border-line bg-raised px-2 py-1 text-sm text-ink">
                  {periods.map((p) => <option key={p.id} value={p.id}>{p.name}</option>)}
                </select>
              </label>
              <label className="text-xs text-muted">
                Second period
                <select name="b" defaultValue={periods[1]!.id} className="mt-1 block rounded border border-line bg-raised px-2 py-1 text-sm text-ink">
                  {periods.map((p) => <option key={p.id} value={p.id}>{p.name}</option>)}
                </select>
              </label>
              <button type="submit" className="rounded border border-line px-3 py-1 text-sm">Compare side by side</button>
            </form>
          )}
        </>
      )}
    </section>
  );
}
