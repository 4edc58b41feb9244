import { listTokens } from "@/db/tokens";
import { requireRole } from "@/lib/auth/guards";
import { Time } from "@/components/ui/Time";
import { AdminTabs } from "../AdminTabs";
import { revokeTokenAction } from "../actions";
import { TokenForm } from "./TokenForm";

export const metadata = { title: "Machine tokens" };
export const dynamic = "force-dynamic";

export default async function TokensPage() {
  await requireRole("admin.tokens");
  const tokens = await listTokens();
  return (
    <section>
      <h1 className="mb-3 text-xl font-semibold">Admin</h1>
      <AdminTabs current="/admin/tokens" />
      <p className="mb-3 text-sm text-muted">The DAQ opens and closes runs with one of these, sent as <code>Authorization: Bearer …</code>.</p>
      <TokenForm />
      {tokens.length === 0 ? (
        <p className="mt-4 text-muted">No tokens yet. Create one for each DAQ host.</p>
      ) : (
        <table className="mt-4 w-full text-sm">
          <thead className="text-left text-xs text-muted"><tr><th className="py-1">Name</th><th>Created</th><th>Last used</th><th>State</th><th /></tr></thead>
          <tbody>
            {tokens.map((t) => (
              <tr key={t.id} className="border-t border-line">
                <td className="py-1.5">{t.name}</td>
                <td><Time at={t.createdAt} /></td>
                <td><Time at={t.lastUsedAt} /></td>
                <td>{t.revokedAt ? "○ revoked" : "● in use"}</td>
                <td>
                  {!t.revokedAt && (
                    <form action={revokeTokenAction}>
                      <input type="hidden" name="id" value={t.id} />
                      <button type="submit" className="rounded border border-line px-2 py-0.5 text-xs">Revoke</button>
                    </form>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
