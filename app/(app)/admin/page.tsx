import { listUsers } from "@/db/users";
import { ROLES } from "@/db/schema/auth";
import { requireRole } from "@/lib/auth/guards";
import { ROLE_LABELS } from "@/components/ui/roles";
import { AdminTabs } from "./AdminTabs";
import { InviteForm } from "./InviteForm";
import { setActiveAction, setRoleAction } from "./actions";

export const metadata = { title: "Admin" };
export const dynamic = "force-dynamic";

export default async function AdminPage() {
  const admin = await requireRole("admin.users");
  const people = await listUsers();
  return (
    <section>
      <h1 className="mb-3 text-xl font-semibold">Admin</h1>
      <AdminTabs current="/admin" />
      <InviteForm />
      <table className="mt-5 w-full text-sm">
        <thead className="text-left text-xs text-muted">
          <tr>
            <th className="py-2">Person</th>
            {ROLES.map((r) => (
              <th key={r} className="px-2">{ROLE_LABELS[r]}</th>
            ))}
            <th className="px-2">Account</th>
          </tr>
        </thead>
        <tbody>
          {people.map((p) => (
            <tr key={p.id} className="border-t border-line">
              <td className="py-2">
                <div className="font-medium">{p.displayName}</div>
                <div className="text-xs text-muted">{p.email}{!p.hasPassword && " · invited, no password yet"}</div>
              </td>
              {ROLES.map((r) => {
                const held = p.roles.includes(r);
                return (
                  <td key={r} className="px-2">
                    <form action={setRoleAction}>
                      <input type="hidden" name="userId" value={p.id} />
                      <input type="hidden" name="role" value={r} />
                      <input type="hidden" name="held" value={held ? "false" : "true"} />
                      <button type="submit" aria-label={`${held ? "Remove" : "Grant"} ${ROLE_LABELS[r]} for ${p.displayName}`} className={`rounded px-2 py-0.5 text-xs ${held ? "bg-good/15 text-good" : "text-muted hover:bg-raised"}`}>
                        {held ? "✓ holds" : "+ grant"}
                      </button>
                    </form>
                  </td>
                );
              })}
              <td className="px-2">
                <form action={setActiveAction}>
                  <input type="hidden" name="userId" value={p.id} />
                  <input type="hidden" name="active" value={p.active ? "false" : "true"} />
                  <span className="mr-2 text-xs">{p.active ? "● active" : "○ deactivated"}</span>
                  {p.id !== admin.id && (
                    <button type="submit" className="rounded border border-line px-2 py-0.5 text-xs">
                      {p.active ? "Deactivate" : "Reactivate"}
                    </button>
                  )}
                </form>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
