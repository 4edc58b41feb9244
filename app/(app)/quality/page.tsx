import Link from "next/link";
import { listFlags, listSubsystems } from "@/db/flags";
import { FLAG_STATES, type FlagState } from "@/db/schema/quality";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { EmptyState } from "@/components/ui/EmptyState";
import { FlagTable } from "./FlagTable";
import { ProposeFlagForm } from "./ProposeFlagForm";
import { QualityTabs } from "./QualityTabs";

export const metadata = { title: "Data quality" };
export const dynamic = "force-dynamic";

const FILTERS: { key: string; label: string; states: FlagState[] }[] = [
  { key: "open", label: "Proposed and confirmed", states: ["proposed", "confirmed"] },
  { key: "proposed", label: "Awaiting confirmation", states: ["proposed"] },
  { key: "confirmed", label: "Confirmed", states: ["confirmed"] },
  { key: "withdrawn", label: "Withdrawn", states: ["withdrawn"] },
  { key: "all", label: "All", states: [...FLAG_STATES] },
];

export default async function QualityPage({ searchParams }: { searchParams: Promise<{ state?: string; subsystem?: string }> }) {
  const user = await requireRole("flags.read");
  const canManage = rolesAllow(user.roles, "flags.manage");
  const sp = await searchParams;
  const filter = FILTERS.find((f) => f.key === sp.state) ?? FILTERS[0]!;
  const [subsystems, awaiting, flags] = await Promise.all([
    listSubsystems(),
    listFlags({ states: ["proposed"], limit: 200 }),
    listFlags({ states: filter.states, subsystem: sp.subsystem || undefined, limit: 300 }),
  ]);
  return (
    <section className="space-y-5">
      <div>
        <h1 className="text-xl font-semibold">Data quality</h1>
        <p className="text-sm text-muted">
          Bad-time flags per subsystem. A flag counts for exposure only once a second detector expert has confirmed it; caution flags never remove time.
        </p>
      </div>
      <QualityTabs current="/quality" />
      {canManage && <ProposeFlagForm subsystems={subsystems.map((s) => ({ code: s.code, label: s.label }))} />}

      <section aria-labelledby="awaiting-heading">
        <h2 id="awaiting-heading" className="mb-2 font-medium">Awaiting confirmation ({awaiting.length})</h2>
        {awaiting.length === 0 ? (
          <EmptyState title="No flags await confirmation.">When a detector expert proposes a flag, it waits here for a second expert.</EmptyState>
        ) : (
          <FlagTable flags={awaiting} viewerId={user.id} canManage={canManage} label="Flags awaiting confirmation" />
        )}
      </section>

      <section aria-labelledby="flags-heading">
        <h2 id="flags-heading" className="mb-2 font-medium">Flags</h2>
        <nav aria-label="Filter flags by state" className="mb-2 flex flex-wrap gap-1 text-sm">
          {FILTERS.map((f) => (
            <Link
              key={f.key}
              href={`/quality?state=${f.key}${sp.subsystem ? `&subsystem=${encodeURIComponent(sp.subsystem)}` : ""}`}
              aria-current={f.key === filter.key ? "page" : undefined}
              className={`rounded px-2 py-1 ${f.key === filter.key ? "bg-raised font-medium" : "text-muted hover:bg-raised/60"}`}
            >
              {f.label}
            </Link>
          ))}
          <form className="ml-auto flex items-center gap-1" action="/quality">
            <input type="hidden" name="state" value={filter.key} />
            <label className="text-xs text-muted">
              Subsystem{" "}
              <select name="subsystem" defaultValue={sp.subsystem ?? ""} className="rounded border border-line bg-raised px-1.5 py-0.5 text-sm text-ink">
                <option value="">any</option>
                {subsystems.map((s) => (
                  <option key={s.code} value={s.code}>{s.label}</option>
                ))}
              </select>
            </label>
            <button type="submit" className="rounded border border-line px-2 py-0.5 text-xs">Show</button>
          </form>
        </nav>
        {flags.length === 0 ? (
          <EmptyState title="No flags match.">
            {canManage ? "Propose the first one above: pick a run, drag across its timeline, say why." : "Detector experts propose flags; they appear here."}
          </EmptyState>
        ) : (
          <FlagTable flags={flags} viewerId={user.id} canManage={canManage} label="Flags" />
        )}
      </section>
    </section>
  );
}
