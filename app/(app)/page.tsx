import Link from "next/link";
import { NAV_ITEMS } from "@/components/shell/nav-items";
import { requireUser } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";

export const metadata = { title: "Overview" };

const BLURBS: Record<string, string> = {
  "/runs": "Every run the DAQ took: type, live time, configuration, quality.",
  "/logbook": "Shift entries with plots and files; the handover checklist.",
  "/quality": "Bad-time flags per subsystem, proposed and confirmed by two experts.",
  "/exposure": "Exposure of each data-quality period in kg·day, run by run.",
  "/limits": "Poisson upper limits on the event rate, per period and combined.",
  "/safety": "Cryogenics, radiation and incident review queue; calibration sources.",
  "/admin": "People, roles, invitations, machine tokens, audit trail.",
};

export default async function OverviewPage() {
  const user = await requireUser();
  const items = NAV_ITEMS.filter((i) => rolesAllow(user.roles, i.action));
  return (
    <section>
      <h1 className="text-xl font-semibold">Kestrin Deep Site · Quillon</h1>
      <p className="mb-5 text-sm text-muted">Signed in as {user.name}. All times are UTC.</p>
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
