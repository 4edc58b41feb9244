import Link from "next/link";
import { notFound } from "next/navigation";
import { getRunDetail } from "@/db/runs";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { Badge } from "@/components/ui/Badge";
import { EmptyState } from "@/components/ui/EmptyState";
import { Time } from "@/components/ui/Time";
import { LiveFractionBar } from "@/components/runs/LiveFractionBar";
import { QualityBadge, StatusBadge } from "@/components/runs/RunBadges";
import { formatCount, formatDuration, formatMass, formatSeconds } from "@/components/runs/format";
import { CloseRunForm } from "./CloseRunForm";

export const dynamic = "force-dynamic";

type Props = { params: Promise<{ number: string }> };

export async function generateMetadata({ params }: Props) {
  return { title: `Run ${(await params).number}` };
}

function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex justify-between gap-4 border-t border-line py-1 text-sm first:border-t-0">
      <dt className="text-muted">{label}</dt>
      <dd className="text-right tabular">{children}</dd>
    </div>
  );
}

export default async function RunPage({ params }: Props) {
  const user = await requireRole("runs.read");
  const text = (await params).number;
  if (!/^\d{1,10}$/.test(text)) notFound();
  const run = await getRunDetail(Number(text));
  if (!run) notFound();
  const canWrite = rolesAllow(user.roles, "runs.write");
  const noteHref = `/logbook/new?category=run_note&run=${run.number}`;
  const conditions = Object.entries(run.conditions);
  const now = new Date();
  return (
    <section>
      <p className="mb-1 text-sm"><Link href="/runs" className="text-accent hover:underline">← All runs</Link></p>
      <h1 className="mb-1 flex flex-wrap items-center gap-2 text-xl font-semibold">
        Run <span className="font-mono">{run.number}</span>
        <StatusBadge status={run.status} />
        <QualityBadge quality={run.quality} />
      </h1>
      <p className="mb-4 text-sm text-muted">{run.type} run on {run.detector}</p>

      <div className="grid gap-4 lg:grid-cols-3">
        <div className="rounded-lg border border-line bg-panel p-4">
          <h2 className="mb-2 text-sm font-semibold">Facts</h2>
          <dl>
            <Fact label="Start (UTC)"><Time at={run.start} withSeconds /></Fact>
            <Fact label="End (UTC)">{run.end ? <Time at={run.end} withSeconds /> : <Badge tone="accent" icon="▶">still running</Badge>}</Fact>
            <Fact label="Duration">{formatDuration(run.durationSeconds)}</Fact>
            <Fact label="Live time">{formatSeconds(run.liveSeconds, 3)}</Fact>
            <Fact label="Dead time">{formatSeconds(run.deadSeconds, 3)}</Fact>
            <Fact label="Trigger count">{formatCount(run.triggerCount)}</Fact>
            <Fact label="Opened by">{run.openedBy ? `${run.openedBy.name}${run.openedBy.kind === "token" ? " (DAQ token)" : ""}` : "DAQ"}</Fact>
          </dl>
          <div className="mt-3 border-t border-line pt-3" data-testid="live-fraction">
            <p className="mb-1 text-xs text-muted">Live fraction (live time ÷ duration)</p>
            <LiveFractionBar fraction={run.liveFraction} wide />
          </div>
        </div>

        <div className="rounded-lg border border-line bg-panel p-4">
          <h2 className="mb-2 text-sm font-semibold">Configuration and target mass</h2>
          <dl>
            <Fact label="Configuration">{run.config.name}</Fact>
            <Fact label="Target material">{run.config.targetMaterial}</Fact>
            <Fact label="Fiducial mass (configuration)">{formatMass(run.config.fiducialMassKg)}</Fact>
            <Fact label="In force from (UTC)"><Time at={run.config.effectiveFrom} /></Fact>
            <Fact label="Target mass in force">
              <strong>{formatMass(run.targetMassKg)}</strong>
              <span className="ml-1 text-xs text-muted">{run.targetMassSource === "override" ? "(overridden for this run)" : "(from the configuration)"}</span>
            </Fact>
          </dl>
        </div>

        <div className="rounded-lg border border-line bg-panel p-4">
          <h2 className="mb-2 text-sm font-semibold">Conditions</h2>
          {conditions.length === 0 ? (
            <p className="text-sm text-muted">No conditions were recorded with this run.</p>
          ) : (
            <table className="w-full text-sm" aria-label="Conditions">
              <tbody>
                {conditions.map(([k, val]) => (
                  <tr key={k} className="border-t border-line first:border-t-0">
                    <th scope="row" className="py-1 pr-3 text-left font-normal text-muted">{k}</th>
                    <td className="py-1 text-right tabular">{String(val)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </div>
      </div>

      {run.status === "running" && canWrite && (
        <div className="mt-4 rounded-lg border border-line bg-panel p-4">
          <h2 className="mb-2 text-sm font-semibold">Close this run</h2>
          <CloseRunForm number={run.number} nowUtc={now.toISOString().slice(0, 19)} elapsedSeconds={(now.getTime() - run.startMs) / 1000} />
        </div>
      )}

      <div className="mt-4 rounded-lg border border-line bg-panel p-4">
        <div className="mb-2 flex items-center justify-between">
          <h2 className="text-sm font-semibold">Logbook entries on this run</h2>
          <Link href={noteHref} className="rounded border border-line px-3 py-1 text-sm hover:bg-raised">✎ Add a note</Link>
        </div>
        {run.entries.length === 0 ? (
          <EmptyState title="No entries mention this run yet">Use “Add a note” to write a run note; entries that link this run appear here.</EmptyState>
        ) : (
          <table className="w-full text-sm" aria-label="Linked entries">
            <thead className="text-left text-xs text-muted">
              <tr><th className="py-1">Entry</th><th>Category</th><th>Author</th><th>Written (UTC)</th></tr>
            </thead>
            <tbody>
              {run.entries.map((e) => (
                <tr key={e.id} className="border-t border-line">
                  <td className="py-1">
                    <Link href={`/logbook/${e.id}`} className="text-accent hover:underline">{e.title}</Link>
                    {e.retracted && <span className="ml-2"><Badge tone="muted" icon="⊘">retracted</Badge></span>}
                  </td>
                  <td>{e.category.replace(/_/g, " ")}</td>
                  <td>{e.author}</td>
                  <td><Time at={e.createdAt} /></td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </div>
    </section>
  );
}
