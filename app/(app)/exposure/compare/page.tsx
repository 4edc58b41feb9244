import Link from "next/link";
import { getPeriod, listPeriods, type PeriodRecord } from "@/db/periods";
import { loadPeriodReport } from "@/db/exposure";
import { requireRole } from "@/lib/auth/guards";
import { ExposureInputError } from "@/lib/exposure";
import { EmptyState } from "@/components/ui/EmptyState";
import { Time } from "@/components/ui/Time";
import { BlindBadge } from "@/components/exposure/BlindBadge";
import { CompareChart } from "@/components/exposure/ExposureCharts";
import { TotalsPanel } from "@/components/exposure/TotalsPanel";
import { alignByDay } from "@/components/exposure/compare";
import { days, fixed, kgDay, signed } from "@/components/exposure/format";

export const metadata = { title: "Compare periods" };
export const dynamic = "force-dynamic";

async function load(idText: string | undefined) {
  const id = Number(idText);
  const period = Number.isInteger(id) && id > 0 ? await getPeriod(id) : null;
  if (!period) return null;
  try {
    return { period, computed: await loadPeriodReport(period, { series: true, maxRows: 0 }), problem: null };
  } catch (err) {
    if (!(err instanceof ExposureInputError)) throw err;
    return { period, computed: null, problem: err.message };
  }
}

function Picker({ periods, a, b }: { periods: PeriodRecord[]; a?: string; b?: string }) {
  return (
    <form action="/exposure/compare" className="flex flex-wrap items-end gap-2" aria-label="Choose two periods">
      {(["a", "b"] as const).map((key, i) => (
        <label key={key} className="text-xs text-muted">
          {i === 0 ? "First period" : "Second period"}
          <select name={key} defaultValue={(i === 0 ? a : b) ?? periods[i]?.id} className="mt-1 block rounded border border-line bg-raised px-2 py-1 text-sm text-ink">
            {periods.map((p) => <option key={p.id} value={p.id}>{p.name}</option>)}
          </select>
        </label>
      ))}
      <button type="submit" className="rounded border border-line px-3 py-1 text-sm">Compare</button>
    </form>
  );
}

export default async function ComparePage({ searchParams }: { searchParams: Promise<{ a?: string; b?: string }> }) {
  await requireRole("periods.read");
  const sp = await searchParams;
  const [periods, left, right] = await Promise.all([listPeriods(), load(sp.a), load(sp.b)]);
  const sides = [left, right];
  const both = left?.computed && right?.computed ? { a: left, b: right } : null;
  const lengthDays = (p: PeriodRecord) => (p.endAt.getTime() - p.startAt.getTime()) / 86_400_000;
  return (
    <section className="space-y-4">
      <p className="text-sm"><Link href="/exposure" className="text-accent hover:underline">← Exposure</Link></p>
      <h1 className="text-xl font-semibold">Compare two periods</h1>
      {periods.length < 2 ? (
        <EmptyState title="Comparing needs two periods.">Define another data-quality period first.</EmptyState>
      ) : (
        <Picker periods={periods} a={sp.a} b={sp.b} />
      )}
      {(!left || !right) && periods.length >= 2 && <p className="text-sm text-muted">Pick two periods above to put them side by side.</p>}
      <div className="grid gap-4 xl:grid-cols-2">
        {sides.map((side, i) =>
          side ? (
            <article key={i} className="space-y-2 rounded-lg border border-line bg-panel p-3" aria-label={side.period.name}>
              <h2 className="flex items-center gap-2 font-medium">
                <Link href={`/exposure/${side.period.id}`} className="text-accent hover:underline">{side.period.name}</Link> <BlindBadge blind={side.period.blind} />
              </h2>
              <p className="text-xs text-muted tabular">
                <Time at={side.period.startAt} /> → <Time at={side.period.endAt} /> UTC ({fixed(lengthDays(side.period), 2)} d) · {side.period.runTypes.join(", ")} · acceptance {fixed(side.period.signalAcceptance, 3)}
              </p>
              {side.problem && <p role="alert" className="text-sm text-bad">⚠ {side.problem}</p>}
              {side.computed && <TotalsPanel totals={side.computed.report.totals} prefix={i === 0 ? "a" : "b"} />}
            </article>
          ) : null,
        )}
      </div>
      {both && (
        <>
          <table className="text-sm tabular" aria-label="Differences">
            <thead className="text-left text-xs text-muted"><tr><th className="py-1 pr-4" /><th className="pr-4">{both.a.period.name}</th><th className="pr-4">{both.b.period.name}</th><th>second − first</th></tr></thead>
            <tbody>
              {[
                { label: "Good live time", a: both.a.computed!.report.totals.goodLiveSeconds, b: both.b.computed!.report.totals.goodLiveSeconds, show: (v: number) => days(v), diff: (v: number) => `${signed(v / 86_400, 4)} d` },
                { label: "Exposure", a: both.a.computed!.report.totals.exposureKgDay, b: both.b.computed!.report.totals.exposureKgDay, show: kgDay, diff: (v: number) => `${signed(v, 3)} kg·day` },
                { label: "Exposure per day of period", a: both.a.computed!.report.totals.exposureKgDay / lengthDays(both.a.period), b: both.b.computed!.report.totals.exposureKgDay / lengthDays(both.b.period), show: (v: number) => `${fixed(v, 3)} kg·day/d`, diff: (v: number) => `${signed(v, 3)} kg·day/d` },
              ].map((r) => (
                <tr key={r.label} className="border-t border-line"><td className="py-1 pr-4 text-muted">{r.label}</td><td className="pr-4">{r.show(r.a)}</td><td className="pr-4">{r.show(r.b)}</td><td>{r.diff(r.b - r.a)}</td></tr>
              ))}
            </tbody>
          </table>
          <figure className="rounded-lg border border-line bg-panel p-3">
            <figcaption className="mb-1 text-sm font-medium">Cumulative exposure (kg·day) against days since each period&apos;s start</figcaption>
            <CompareChart
              aligned={alignByDay(
                { startSec: both.a.period.startAt.getTime() / 1000, lengthDays: lengthDays(both.a.period), curve: both.a.computed!.series!.cumulative },
                { startSec: both.b.period.startAt.getTime() / 1000, lengthDays: lengthDays(both.b.period), curve: both.b.computed!.series!.cumulative },
              )}
              names={[both.a.period.name, both.b.period.name]}
              label="Cumulative exposure of both periods"
            />
          </figure>
        </>
      )}
    </section>
  );
}
