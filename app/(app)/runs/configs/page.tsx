import { listConfigs } from "@/db/configs";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { configInForce } from "@/lib/runs";
import { Badge } from "@/components/ui/Badge";
import { EmptyState } from "@/components/ui/EmptyState";
import { Time } from "@/components/ui/Time";
import { RunsTabs } from "@/components/runs/RunsTabs";
import { formatMass } from "@/components/runs/format";
import { ConfigForm } from "./ConfigForm";

export const metadata = { title: "Detector configurations" };
export const dynamic = "force-dynamic";

export default async function ConfigsPage() {
  const user = await requireRole("runs.read");
  const canManage = rolesAllow(user.roles, "configs.manage");
  const configs = await listConfigs();
  const dated = configs.map((c) => ({ ...c, effectiveFromMs: Date.parse(c.effectiveFrom) }));
  const now = Date.now();
  const current = new Set(
    [...new Set(configs.map((c) => c.detector))].map((d) => configInForce(dated, d, now)?.id).filter((id): id is number => id !== undefined),
  );
  return (
    <section>
      <h1 className="mb-3 text-xl font-semibold">Runs</h1>
      <RunsTabs current="/runs/configs" />
      <p className="mb-3 text-sm text-muted">
        A run takes the configuration of its detector in force at its start (the latest effective at or before it), unless the run overrides the
        target mass.
      </p>
      {canManage && (
        <details className="mb-4 rounded-lg border border-line bg-panel p-3">
          <summary className="cursor-pointer text-sm font-medium">Add a configuration</summary>
          <div className="mt-3"><ConfigForm nowUtc={new Date().toISOString().slice(0, 19)} /></div>
        </details>
      )}
      {configs.length === 0 ? (
        <EmptyState title="No detector configurations yet">
          Runs cannot be opened until a detector expert adds the first configuration (target material, fiducial mass, effective time).
        </EmptyState>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-line bg-panel">
          <table className="w-full text-sm" aria-label="Detector configurations">
            <thead className="bg-raised/50 text-left text-xs text-muted">
              <tr>
                <th className="px-2 py-1.5">Detector</th><th className="px-2">Name</th><th className="px-2">Target material</th>
                <th className="px-2 text-right">Fiducial mass</th><th className="px-2">Effective from (UTC)</th><th className="px-2">State</th><th className="px-2">Notes</th>
              </tr>
            </thead>
            <tbody>
              {configs.map((c) => (
                <tr key={c.id} className="border-t border-line">
                  <td className="px-2 py-1">{c.detector}</td>
                  <td className="px-2">{c.name}</td>
                  <td className="px-2">{c.targetMaterial}</td>
                  <td className="px-2 text-right tabular">{formatMass(c.fiducialMassKg)}</td>
                  <td className="px-2"><Time at={c.effectiveFrom} /></td>
                  <td className="px-2">
                    {current.has(c.id) ? (
                      <Badge tone="good" icon="●">in force now</Badge>
                    ) : Date.parse(c.effectiveFrom) > now ? (
                      <Badge tone="info" icon="◷">scheduled</Badge>
                    ) : (
                      <Badge tone="muted" icon="○">superseded</Badge>
                    )}
                  </td>
                  <td className="px-2 text-xs text-muted">{c.notes}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
