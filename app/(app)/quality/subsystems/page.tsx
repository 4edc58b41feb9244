import { listSubsystems } from "@/db/flags";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { Badge } from "@/components/ui/Badge";
import { EmptyState } from "@/components/ui/EmptyState";
import { setSubsystemActiveAction } from "../actions";
import { QualityTabs } from "../QualityTabs";
import { SubsystemForm } from "./SubsystemForm";

export const metadata = { title: "Subsystems" };
export const dynamic = "force-dynamic";

export default async function SubsystemsPage() {
  const user = await requireRole("flags.read");
  const canManage = rolesAllow(user.roles, "flags.manage");
  const rows = await listSubsystems(true);
  return (
    <section className="max-w-3xl">
      <h1 className="mb-3 text-xl font-semibold">Data quality</h1>
      <QualityTabs current="/quality/subsystems" />
      <p className="mb-3 text-sm text-muted">Every flag names one subsystem. A deactivated subsystem is no longer offered for new flags; flags already naming it stay as they are.</p>
      {canManage && <SubsystemForm />}
      {rows.length === 0 ? (
        <EmptyState title="No subsystems yet.">A detector expert adds the first one (for example TPC or cryogenics) above.</EmptyState>
      ) : (
        <table className="mt-4 w-full text-sm" aria-label="Subsystems">
          <thead className="text-left text-xs text-muted"><tr><th className="py-1">Subsystem</th><th>Code</th><th>State</th>{canManage && <th />}</tr></thead>
          <tbody>
            {rows.map((s) => (
              <tr key={s.code} className="border-t border-line">
                <td className="py-1.5">{s.label}</td>
                <td className="font-mono text-xs">{s.code}</td>
                <td>{s.active ? <Badge tone="good" icon="●">active</Badge> : <Badge tone="muted" icon="○">deactivated</Badge>}</td>
                {canManage && (
                  <td>
                    <form action={setSubsystemActiveAction}>
                      <input type="hidden" name="code" value={s.code} />
                      <input type="hidden" name="active" value={s.active ? "false" : "true"} />
                      <button type="submit" aria-label={`${s.active ? "Deactivate" : "Reactivate"} ${s.label}`} className="rounded border border-line px-2 py-0.5 text-xs">
                        {s.active ? "Deactivate" : "Reactivate"}
                      </button>
                    </form>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
