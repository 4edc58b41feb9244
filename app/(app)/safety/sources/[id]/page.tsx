import Link from "next/link";
import { notFound } from "next/navigation";
import { custodianChoices, getSource, listCheckouts, runsOverlapping } from "@/db/sources";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { activityAt, activitySeries } from "@/lib/safety/decay";
import { EmptyState } from "@/components/ui/EmptyState";
import { Time } from "@/components/ui/Time";
import { Badge } from "@/components/ui/Badge";
import { ActivityChart } from "@/components/safety/ActivityChart";
import { RunTimeline } from "@/components/safety/RunTimeline";
import { CheckoutForm, LeakTestForm, ReturnForm, RunsForm } from "@/components/safety/SourceForms";
import { EditSourceForm } from "@/components/safety/EditSourceForm";
import { CheckoutBadge, FormBadge, LeakBadge } from "@/components/safety/SourceBadges";
import { formatHoursMinutes } from "@/components/safety/age";
import { activityText, decayWaits, describeSource, factsFromRow, microCurieText, scienceRunsInsideWaits } from "@/components/safety/source-status";

export const metadata = { title: "Calibration source" };
export const dynamic = "force-dynamic";

const YEAR_MS = 365.25 * 86_400_000;
/** How many of the latest injections get a timeline strip. */
const STRIPS = 3;

export default async function SourcePage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireRole("sources.read");
  const id = Number((await params).id);
  const source = Number.isSafeInteger(id) && id > 0 ? await getSource(id) : null;
  if (!source) notFound();
  const canCheckout = rolesAllow(user.roles, "sources.checkout");
  const canManage = rolesAllow(user.roles, "sources.manage");
  const now = Date.now();
  const checkouts = await listCheckouts({ sourceId: source.id });
  const facts = checkouts.map((c) => ({ id: c.id, checkedOutMs: c.checkedOutAt.getTime(), returnedMs: c.returnedAt?.getTime() ?? null }));
  const d = describeSource(source, facts, now);
  const open = checkouts.find((c) => c.returnedAt === null);
  const waits = decayWaits(factsFromRow(source), facts);
  const recentWaits = waits.slice(-STRIPS).reverse();
  const stripRuns = recentWaits.length
    ? await runsOverlapping(new Date(Math.min(...recentWaits.map((w) => w.injectedMs)) - 6 * 3_600_000), new Date(Math.max(...recentWaits.map((w) => w.waitEndMs)) + 6 * 3_600_000))
    : [];
  const spans = stripRuns.map((r) => ({ number: r.number, type: r.type, startMs: r.startAt.getTime(), endMs: r.endAt?.getTime() ?? null }));
  const inside = scienceRunsInsideWaits(spans, waits, now);

  let chart: { x: number[]; y: number[]; kind: "utc" | "hours"; threshold?: number } | null = null;
  if (d.halfLife && source.form === "sealed") {
    const ref = { a0Bq: source.referenceActivityBq, refMs: source.referenceDate.getTime(), halfLifeS: d.halfLife.seconds };
    const start = Math.min(ref.refMs, now - YEAR_MS);
    const end = Math.max(ref.refMs, now) + Math.min(2 * d.halfLife.seconds * 1000, 10 * YEAR_MS);
    const pts = activitySeries(ref, start, end, 200);
    chart = { x: pts.map((p) => p.tMs / 1000), y: pts.map((p) => p.activityBq), kind: "utc" };
  } else if (d.halfLife && d.decayWait) {
    const ref = { a0Bq: source.referenceActivityBq, refMs: 0, halfLifeS: d.halfLife.seconds };
    const pts = activitySeries(ref, 0, d.decayWait.seconds * 1200, 150);
    chart = { x: pts.map((p) => p.tMs / 3_600_000), y: pts.map((p) => p.activityBq), kind: "hours", threshold: source.referenceActivityBq * d.decayWait.fraction };
  }
  const latest = waits[waits.length - 1];
  const inDetectorNow = latest && d.halfLife ? activityAt({ a0Bq: source.referenceActivityBq, refMs: latest.injectedMs, halfLifeS: d.halfLife.seconds }, now) : null;

  return (
    <div>
      <p className="mb-2 text-sm"><Link href="/safety/sources" className="text-accent underline">← Calibration sources</Link></p>
      <h1 className="flex flex-wrap items-center gap-2 text-xl font-semibold">
        {source.nuclide} · {source.serial} <FormBadge form={source.form} /> <span data-testid="checkout-state"><CheckoutBadge checkout={d.checkout} /></span> <LeakBadge leak={d.leakTest} />
      </h1>
      <div className="mt-3 grid gap-4 lg:grid-cols-2">
        <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="text-muted">Nuclide</dt>
          <dd>{d.halfLife?.name ?? `${source.nuclide} (not in the built-in table)`}</dd>
          <dt className="text-muted">Half-life</dt>
          <dd>{d.halfLife ? <>{d.halfLife.value} ± {d.halfLife.uncertainty} {d.halfLife.unit} <span className="text-xs text-muted">({d.halfLife.source})</span></> : "—"}</dd>
          {d.halfLife?.note && (<><dt className="text-muted">Note</dt><dd className="text-muted">{d.halfLife.note}</dd></>)}
          <dt className="text-muted">Certificate</dt>
          <dd>{activityText(source.referenceActivityBq)} ({microCurieText(source.referenceActivityBq)}) on <Time at={source.referenceDate} /> UTC</dd>
          <dt className="text-muted">Location</dt>
          <dd>{source.location}</dd>
          <dt className="text-muted">Custodian</dt>
          <dd>{source.custodianName ?? "none named"}</dd>
          <dt className="text-muted">Allowed time out</dt>
          <dd>{source.allowedOutHours} h</dd>
          {source.form === "sealed" && (<><dt className="text-muted">Leak tests</dt><dd>every {source.leakTestIntervalMonths ?? "—"} months; last <Time at={source.lastLeakTestAt} /></dd></>)}
          {source.notes && (<><dt className="text-muted">Notes</dt><dd>{source.notes}</dd></>)}
        </dl>
        <div className="rounded-lg border border-line bg-panel p-4">
          {d.activityNow ? (
            <>
              <p className="text-xs text-muted">Activity today (decay law from the certificate)</p>
              <p className="tabular text-2xl font-semibold" data-testid="activity-today">{d.activityNow.text} <span className="text-base text-muted">± {d.activityNow.sigmaText}</span></p>
              <p className="tabular text-sm text-muted">{Math.round(d.activityNow.bq).toLocaleString("en-GB")} Bq · {d.activityNow.microCurieText}</p>
              <p className="mt-1 text-xs text-muted">Uncertainty from the half-life only; the certificate&apos;s own uncertainty is not recorded here.</p>
            </>
          ) : d.decayWait ? (
            <>
              <p className="text-xs text-muted">Decay wait after each injection</p>
              <p className="text-2xl font-semibold" data-testid="decay-wait">{formatHoursMinutes(d.decayWait.seconds)}</p>
              <p className="text-sm text-muted">until the activity falls below {d.decayWait.fraction} of the injected {activityText(source.referenceActivityBq)} (T½ · log₂(1/f)); science data counts again after it.</p>
              {latest && inDetectorNow !== null && (
                <p className="mt-2 text-sm">
                  Latest injection <Time at={new Date(latest.injectedMs)} />: {latest.waitEndMs > now
                    ? <Badge tone="warn" icon="◷">Decay wait until {new Date(latest.waitEndMs).toISOString().slice(0, 16).replace("T", " ")} UTC</Badge>
                    : <Badge tone="good" icon="✓">Wait over</Badge>} · in the detector now ≈ {activityText(inDetectorNow)}
                </p>
              )}
            </>
          ) : (
            <p className="text-sm text-muted">No half-life for this nuclide in the built-in table.</p>
          )}
        </div>
      </div>
      {chart && (
        <div className="mt-4 rounded-lg border border-line bg-panel p-3">
          <h2 className="mb-1 text-sm font-semibold">{chart.kind === "utc" ? "Activity against time" : "Activity after one injection (log scale), with the decay-wait threshold"}</h2>
          <ActivityChart x={chart.x} y={chart.y} xKind={chart.kind} {...(chart.threshold !== undefined ? { thresholdBq: chart.threshold } : {})} label={`Activity of ${source.nuclide} ${source.serial} against time`} />
        </div>
      )}
      {source.form === "gaseous" && (
        <section className="mt-4" aria-label="Run timeline">
          <h2 className="mb-1 font-semibold">Run timeline: decay waits</h2>
          {recentWaits.length === 0 ? (
            <EmptyState title="No injection recorded yet">A checkout of this source is an injection; its decay wait shows here.</EmptyState>
          ) : (
            recentWaits.map((w) => (
              <RunTimeline key={w.checkoutId} injectedMs={w.injectedMs} waitEndMs={w.waitEndMs} runs={spans.filter((r) => r.startMs < w.waitEndMs + 6 * 3_600_000 && (r.endMs ?? now) > w.injectedMs - 6 * 3_600_000)} nowMs={now} />
            ))
          )}
          {inside.length > 0 ? (
            <ul className="mt-2 space-y-1 text-sm" aria-label="Science runs inside a decay wait">
              {waits.filter((w) => inside.some((x) => x.wait.checkoutId === w.checkoutId)).reverse().map((w) => (
                <li key={w.checkoutId}>
                  Injection <Time at={new Date(w.injectedMs)} />: <Badge tone="bad" icon="⚠">inside decay wait</Badge>{" "}
                  science run{inside.filter((x) => x.wait.checkoutId === w.checkoutId).length > 1 ? "s" : ""}{" "}
                  {inside.filter((x) => x.wait.checkoutId === w.checkoutId).map((x, i) => (
                    <span key={x.run.number}>{i > 0 && ", "}<Link href={`/runs/${x.run.number}`} className="text-accent underline">{x.run.number}</Link></span>
                  ))}
                </li>
              ))}
            </ul>
          ) : (
            recentWaits.length > 0 && <p className="mt-1 text-sm text-muted">No science run falls inside a decay wait shown here.</p>
          )}
        </section>
      )}
      <section className="mt-6">
        <h2 className="mb-2 font-semibold">{source.form === "gaseous" ? "Injections (checkouts)" : "Checkouts"}</h2>
        {canCheckout && (open ? <ReturnForm sourceId={source.id} checkoutId={open.id} /> : <CheckoutForm sourceId={source.id} />)}
        {checkouts.length === 0 ? (
          <div className="mt-3"><EmptyState title="Never checked out">{canCheckout ? "Check it out above when a calibration needs it." : "Detector experts and safety officers record checkouts."}</EmptyState></div>
        ) : (
          <table className="mt-3 w-full text-sm" aria-label="Checkouts">
            <thead className="text-left text-xs text-muted">
              <tr><th className="py-1.5 pr-2">Out (UTC)</th><th className="pr-2">By</th><th className="pr-2">Purpose</th><th className="pr-2">Back (UTC)</th><th className="pr-2">Calibration runs</th></tr>
            </thead>
            <tbody>
              {checkouts.map((c) => (
                <tr key={c.id} className="border-t border-line align-top">
                  <td className="py-1.5 pr-2"><Time at={c.checkedOutAt} /></td>
                  <td className="pr-2">{c.checkedOutByName}</td>
                  <td className="pr-2">{c.purpose}</td>
                  <td className="pr-2">{c.returnedAt ? <><Time at={c.returnedAt} /> <span className="text-xs text-muted">{c.returnedByName}</span></> : <CheckoutBadge checkout={d.checkout} />}</td>
                  <td className="pr-2">
                    {canCheckout ? <RunsForm sourceId={source.id} checkoutId={c.id} runNumbers={c.runNumbers} /> : c.runNumbers.join(", ") || <span className="text-muted">none linked</span>}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </section>
      {canManage && source.form === "sealed" && (
        <section className="mt-6">
          <h2 className="mb-2 font-semibold">Leak test</h2>
          <LeakTestForm sourceId={source.id} />
        </section>
      )}
      {canManage && (
        <section className="mt-6">
          <h2 className="mb-2 font-semibold">Inventory details</h2>
          <EditSourceForm source={source} custodians={await custodianChoices()} />
        </section>
      )}
    </div>
  );
}
