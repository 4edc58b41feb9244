import Link from "next/link";
import { NAV_ITEMS } from "@/components/shell/nav-items";
import { StatusBadge } from "@/components/runs/RunBadges";
import { CategoryBadge } from "@/components/logbook/CategoryBadge";
import { Badge } from "@/components/ui/Badge";
import { EmptyState } from "@/components/ui/EmptyState";
import { Time } from "@/components/ui/Time";
import { formatAge } from "@/components/safety/age";
import { listRuns } from "@/db/runs";
import { listFeed } from "@/db/entry-feed";
import { queueCounts } from "@/db/safety";
import { requireUser } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";

export const metadata = { title: "Overview" };
export const dynamic = "force-dynamic";

const BLURBS: Record<string, string> = {
  "/runs": "Every run the DAQ took: type, live time, configuration, quality.",
  "/logbook": "Shift entries with plots and files; the handover checklist.",
  "/quality": "Bad-time flags per subsystem, proposed and confirmed by two experts.",
  "/exposure": "Exposure of each data-quality period in kg·day, run by run.",
  "/limits": "Poisson upper limits on the event rate, per period and combined.",
  "/safety": "Cryogenics, radiation and incident review queue; calibration sources; oxygen estimate.",
  "/admin": "People, roles, invitations, machine tokens, audit trail.",
};

export default async function OverviewPage() {
  const user = await requireUser();
  const items = NAV_ITEMS.filter((i) => rolesAllow(user.roles, i.action));
  const reviews = rolesAllow(user.roles, "safety.review");
  const [open, recent, counts] = await Promise.all([
    listRuns({ type: null, status: "running", fromMs: null, toMs: null, cursor: null, limit: 5 }),
    listFeed({ limit: 6 }),
    reviews ? queueCounts() : Promise.resolve(null),
  ]);
  return (
    <section>
      <h1 className="text-xl font-semibold">Kestrin Deep Site · Quillon</h1>
      <p className="mb-5 text-sm text-muted">Signed in as {user.name}. All times are UTC; hover a time for your local time.</p>

      <div className="mb-6 grid gap-4 lg:grid-cols-2">
        <div className="rounded-lg border border-line bg-panel p-4">
          <h2 className="mb-2 font-medium">Taking data now</h2>
          {open.runs.length === 0 ? (
            <EmptyState title="No run is open">The DAQ opens runs itself; shift crews can open one on the Runs page.</EmptyState>
          ) : (
            <ul className="divide-y divide-line text-sm">
              {open.runs.map((r) => (
                <li key={r.number} className="flex flex-wrap items-center gap-3 py-2">
                  <Link href={`/runs/${r.number}`} className="font-mono text-accent">{r.number}</Link>
                  <StatusBadge status={r.status} />
                  <span>{r.type} on {r.detector}</span>
                  <span className="text-muted">since <Time at={r.start} /> ({formatAge(Date.now() - r.startMs)})</span>
                </li>
              ))}
            </ul>
          )}
        </div>
        <div className="rounded-lg border border-line bg-panel p-4">
          <h2 className="mb-2 font-medium">Latest in the logbook</h2>
          {recent.items.length === 0 ? (
            <EmptyState title="No entries yet">Start with a shift handover from the Logbook page.</EmptyState>
          ) : (
            <ul className="divide-y divide-line text-sm">
              {recent.items.map((e) => (
                <li key={e.id} className="flex flex-wrap items-center gap-3 py-2">
                  <CategoryBadge category={e.category} />
                  <Link href={`/logbook/${e.id}`} className="min-w-0 flex-1 truncate hover:text-accent">{e.title}</Link>
                  <span className="text-xs text-muted">{e.authorName} · <Time at={e.createdAt} /></span>
                </li>
              ))}
            </ul>
          )}
        </div>
        {counts && (
          <div className="rounded-lg border border-line bg-panel p-4 lg:col-span-2">
            <h2 className="mb-2 font-medium">Safety review queue</h2>
            <div className="flex flex-wrap items-center gap-3 text-sm">
              <Badge tone={counts.awaiting_review ? "warn" : "good"} icon={counts.awaiting_review ? "◔" : "✓"}>{counts.awaiting_review} awaiting review</Badge>
              <Badge tone={counts.follow_up ? "info" : "muted"} icon="↺">{counts.follow_up} follow-up needed</Badge>
              <Link href="/safety" className="text-accent underline">Open the queue</Link>
            </div>
          </div>
        )}
      </div>

      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {items.map((i) => (
          <Link key={i.href} href={i.href} className="rounded-lg border border-line bg-panel p-4 hover:border-accent">
            <div className="font-medium"><span aria-hidden className="mr-2 font-mono">{i.glyph}</span>{i.label}</div>
            <p className="mt-1 text-sm text-muted">{BLURBS[i.href]}</p>
          </Link>
        ))}
      </div>
    </section>
  );
}
