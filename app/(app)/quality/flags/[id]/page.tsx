import Link from "next/link";
import { notFound } from "next/navigation";
import { flagHistory, getFlag } from "@/db/flags";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { FlagStateBadge, VerdictBadge } from "@/components/quality/FlagBadges";
import { Time } from "@/components/ui/Time";
import { hours } from "@/components/exposure/format";
import { FlagSteps } from "../../FlagSteps";

export const metadata = { title: "Flag" };
export const dynamic = "force-dynamic";

const ACTION_WORDS: Record<string, string> = { proposed: "◌ proposed", confirmed: "✓ confirmed", withdrawn: "⊘ withdrawn" };

export default async function FlagPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireRole("flags.read");
  const id = Number((await params).id);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const flag = await getFlag(id);
  if (!flag) notFound();
  const history = await flagHistory(id);
  const canManage = rolesAllow(user.roles, "flags.manage");
  return (
    <section className="max-w-4xl space-y-4">
      <p className="text-sm"><Link href="/quality" className="text-accent hover:underline">← Data quality</Link></p>
      <h1 className="flex flex-wrap items-center gap-2 text-xl font-semibold">
        Flag #{flag.id} <FlagStateBadge state={flag.state} /> <VerdictBadge verdict={flag.verdict} />
      </h1>
      <dl className="grid grid-cols-[10rem_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-muted">Subsystem</dt><dd>{flag.subsystemLabel}</dd>
        <dt className="text-muted">Start (UTC)</dt><dd><Time at={flag.startAt} withSeconds /></dd>
        <dt className="text-muted">End (UTC)</dt><dd><Time at={flag.endAt} withSeconds /></dd>
        <dt className="text-muted">Length</dt><dd className="tabular">{hours((flag.endAt.getTime() - flag.startAt.getTime()) / 1000)}</dd>
        <dt className="text-muted">Reason</dt><dd>{flag.reason}</dd>
        <dt className="text-muted">Proposed by</dt><dd>{flag.proposedBy.name} · <Time at={flag.proposedAt} /></dd>
        {flag.confirmedBy && (<><dt className="text-muted">Confirmed by</dt><dd>{flag.confirmedBy.name} · <Time at={flag.confirmedAt} /></dd></>)}
        {flag.withdrawnBy && (<><dt className="text-muted">Withdrawn by</dt><dd>{flag.withdrawnBy.name} · <Time at={flag.withdrawnAt} /> — {flag.withdrawReason}</dd></>)}
      </dl>
      <p className="text-sm text-muted">
        {flag.state === "proposed" && "Not yet used for exposure: a second detector expert must confirm it."}
        {flag.state === "confirmed" && (flag.verdict === "exclude" ? "Used for exposure: this time is removed from every period it falls in." : "Shown as caution beside the data; it removes no time.")}
        {flag.state === "withdrawn" && "Withdrawn: never used for exposure; kept here for the record."}
      </p>
      {canManage && <FlagSteps flagId={flag.id} state={flag.state} ownProposal={flag.proposedBy.id === user.id} />}
      <section aria-labelledby="history-heading">
        <h2 id="history-heading" className="mb-1 font-medium">History</h2>
        <ol className="space-y-1 text-sm">
          {history.map((e) => (
            <li key={e.id} className="border-l-2 border-line pl-3">
              <Time at={e.at} withSeconds /> · {ACTION_WORDS[e.action] ?? e.action} by {e.actor.name}
              {e.comment && <div className="text-muted">{e.comment}</div>}
            </li>
          ))}
        </ol>
      </section>
    </section>
  );
}
