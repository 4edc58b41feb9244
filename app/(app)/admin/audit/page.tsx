import { recentAudit } from "@/db/audit";
import { requireRole } from "@/lib/auth/guards";
import { Time } from "@/components/ui/Time";
import { AdminTabs } from "../AdminTabs";

export const metadata = { title: "Audit trail" };
export const dynamic = "force-dynamic";

export default async function AuditPage() {
  await requireRole("admin.users");
  const rows = await recentAudit(200);
  return (
    <section>
      <h1 className="mb-3 text-xl font-semibold">Admin</h1>
      <AdminTabs current="/admin/audit" />
      {rows.length === 0 ? (
        <p className="text-muted">Nothing recorded yet. Every change made in Deepshift will appear here.</p>
      ) : (
        <table className="w-full text-sm">
          <thead className="text-left text-xs text-muted">
            <tr><th className="py-1">When (UTC)</th><th>Who</th><th>Action</th><th>Record</th><th>Details</th></tr>
          </thead>
          <tbody className="font-mono text-xs">
            {rows.map((r) => (
              <tr key={r.id} className="border-t border-line align-top">
                <td className="py-1 pr-3"><Time at={r.at} withSeconds /></td>
                <td className="pr-3">{r.actorUserId ? `user ${r.actorUserId}` : r.actorTokenId ? `token ${r.actorTokenId}` : "system"}</td>
                <td className="pr-3">{r.action}</td>
                <td className="pr-3">{r.recordType} {r.recordId}</td>
                <td className="break-all text-muted">{r.details ? JSON.stringify(r.details) : ""}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
