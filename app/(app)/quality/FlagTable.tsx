import Link from "next/link";
import type { FlagView } from "@/db/flags";
import { FlagStateBadge, VerdictBadge } from "@/components/quality/FlagBadges";
import { Time } from "@/components/ui/Time";
import { hours } from "@/components/exposure/format";
import { FlagSteps } from "./FlagSteps";

/** A dense table of flags; the steps column appears for people who may manage flags. */
export function FlagTable({ flags, viewerId, canManage, label }: { flags: FlagView[]; viewerId: number; canManage: boolean; label: string }) {
  return (
    <table className="w-full text-sm" aria-label={label}>
      <thead className="text-left text-xs text-muted">
        <tr>
          <th className="py-1.5 pr-2">Flag</th>
          <th className="pr-2">State</th>
          <th className="pr-2">Verdict</th>
          <th className="pr-2">Subsystem</th>
          <th className="pr-2">Start (UTC)</th>
          <th className="pr-2">End (UTC)</th>
          <th className="pr-2 text-right">Length</th>
          <th className="pr-2">Reason</th>
          <th className="pr-2">Proposed / confirmed by</th>
          {canManage && <th>Steps</th>}
        </tr>
      </thead>
      <tbody>
        {flags.map((f) => (
          <tr key={f.id} className="border-t border-line align-top" data-testid={`flag-row-${f.id}`}>
            <td className="py-1.5 pr-2 tabular"><Link href={`/quality/flags/${f.id}`} className="text-accent hover:underline">#{f.id}</Link></td>
            <td className="pr-2"><FlagStateBadge state={f.state} /></td>
            <td className="pr-2"><VerdictBadge verdict={f.verdict} /></td>
            <td className="pr-2">{f.subsystemLabel}</td>
            <td className="pr-2"><Time at={f.startAt} withSeconds /></td>
            <td className="pr-2"><Time at={f.endAt} withSeconds /></td>
            <td className="whitespace-nowrap pr-2 text-right tabular">{hours((f.endAt.getTime() - f.startAt.getTime()) / 1000, 2)}</td>
            <td className="max-w-md pr-2">{f.reason}{f.withdrawReason && <div className="text-xs text-muted">withdrawn: {f.withdrawReason}</div>}</td>
            <td className="pr-2 text-xs">
              {f.proposedBy.name}
              {f.confirmedBy && <> / {f.confirmedBy.name}</>}
              {f.withdrawnBy && <> · withdrawn by {f.withdrawnBy.name}</>}
            </td>
            {canManage && (
              <td><FlagSteps flagId={f.id} state={f.state} ownProposal={f.proposedBy.id === viewerId} /></td>
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
