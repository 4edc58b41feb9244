import Link from "next/link";
import { PERMISSIONS, type Action } from "@/lib/auth/permissions";
import { ROLE_LABELS } from "@/components/ui/roles";

export const metadata = { title: "Not allowed" };

export default async function NotAllowedPage({ searchParams }: { searchParams: Promise<{ action?: string }> }) {
  const { action } = await searchParams;
  const rule = action && action in PERMISSIONS ? PERMISSIONS[action as Action] : null;
  return (
    <section className="mx-auto mt-10 max-w-lg rounded-lg border border-warn/60 bg-panel p-6" role="alert">
      <h1 className="mb-2 text-xl font-semibold">
        <span aria-hidden>⛔ </span>Not allowed
      </h1>
      <p>
        Your roles do not let you {rule ? rule.label : "open that page"}.
        {rule && <> It needs one of: {rule.roles.map((r) => ROLE_LABELS[r]).join(", ")}.</>}
      </p>
      <p className="mt-3 text-sm text-muted">If you need it for your work, ask an admin to grant the role.</p>
      <Link href="/" className="mt-4 inline-block text-accent underline">Back to the overview</Link>
    </section>
  );
}
