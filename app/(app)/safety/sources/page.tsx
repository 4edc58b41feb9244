import Link from "next/link";
import { custodianChoices, listCheckouts, listSources } from "@/db/sources";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { NUCLIDES } from "@/lib/safety/nuclides";
import { EmptyState } from "@/components/ui/EmptyState";
import { Time } from "@/components/ui/Time";
import { describeSource } from "@/components/safety/source-status";
import { CheckoutBadge, FormBadge, LeakBadge } from "@/components/safety/SourceBadges";
import { NewSourceForm } from "@/components/safety/NewSourceForm";

export const metadata = { title: "Calibration sources" };
export const dynamic = "force-dynamic";

export default async function SourcesPage() {
  const user = await requireRole("sources.read");
  const canManage = rolesAllow(user.roles, "sources.manage");
  const [sources, open] = await Promise.all([listSources(), listCheckouts({ openOnly: true })]);
  const now = Date.now();
  const rows = sources.map((s) => ({
    s,
    d: describeSource(s, open.filter((c) => c.sourceId === s.id).map((c) => ({ id: c.id, checkedOutMs: c.checkedOutAt.getTime(), returnedMs: null })), now),
  }));
  return (
    <div>
      <h1 className="mb-1 text-xl font-semibold">Calibration sources</h1>
      <p className="mb-3 text-sm text-muted">
        Activity today follows the decay law from the certificate (A = A₀·2<sup>−t/T½</sup>); its uncertainty comes from the half-life&apos;s. Gaseous sources show their decay wait after each injection on their page.
      </p>
      {rows.length === 0 ? (
        <EmptyState title="No calibration source in the inventory yet">
          {canManage ? "Add the first one with the form below, from its certificate." : "A safety officer adds sources from their certificates."}
        </EmptyState>
      ) : (
        <table className="w-full text-sm" aria-label="Source inventory">
          <thead className="text-left text-xs text-muted">
            <tr>
              <th className="py-1.5 pr-2">Source</th>
              <th className="pr-2">Form</th>
              <th className="pr-2 text-right">Activity today</th>
              <th className="pr-2">Reference (certificate)</th>
              <th className="pr-2">Location · custodian</th>
              <th className="pr-2">Where now</th>
              <th className="pr-2">Leak test</th>
            </tr>
          </thead>
          <tbody>
            {rows.map(({ s, d }) => (
              <tr key={s.id} className="border-t border-line align-top" data-testid={`source-row-${s.serial}`}>
                <td className="py-1.5 pr-2">
                  <Link href={`/safety/sources/${s.id}`} className="font-medium text-accent underline">{s.nuclide} · {s.serial}</Link>
                  {d.halfLife && <div className="text-xs text-muted">T½ {d.halfLife.value} ± {d.halfLife.uncertainty} {d.halfLife.unit}</div>}
                </td>
                <td className="pr-2"><FormBadge form={s.form} /></td>
                <td className="tabular pr-2 text-right">
                  {d.activityNow ? (
                    <>
                      <div>{d.activityNow.text} <span className="text-muted">± {d.activityNow.sigmaText}</span></div>
                      <div className="text-xs text-muted">{d.activityNow.microCurieText}</div>
                    </>
                  ) : (
                    <span className="text-xs text-muted">per injection, see page</span>
                  )}
                </td>
                <td className="pr-2">
                  <span className="tabular">{Math.round(s.referenceActivityBq).toLocaleString("en-GB")} Bq</span>
                  <div className="text-xs text-muted"><Time at={s.referenceDate} /></div>
                </td>
                <td className="pr-2">{s.location}<div className="text-xs text-muted">{s.custodianName ?? "no custodian named"} · {s.allowedOutHours} h out allowed</div></td>
                <td className="pr-2"><CheckoutBadge checkout={d.checkout} /></td>
                <td className="pr-2"><LeakBadge leak={d.leakTest} /></td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {canManage && (
        <NewSourceForm
          nuclides={NUCLIDES.map((n) => ({ id: n.id, name: n.name, form: n.form }))}
          custodians={await custodianChoices()}
        />
      )}
    </div>
  );
}
