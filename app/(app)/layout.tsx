import { cookies } from "next/headers";
import { NAV_ITEMS } from "@/components/shell/nav-items";
import { NavLinks } from "@/components/shell/NavLinks";
import { SessionProvider } from "@/components/shell/SessionProvider";
import { SignOutButton } from "@/components/shell/SignOutButton";
import { ThemeToggle } from "@/components/shell/ThemeToggle";
import { UtcClock } from "@/components/shell/UtcClock";
import { requireUser } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { ROLE_LABELS } from "@/components/ui/roles";

export default async function SignedInLayout({ children }: { children: React.ReactNode }) {
  const user = await requireUser();
  const theme = (await cookies()).get("theme")?.value === "day" ? "day" : "night";
  const items = NAV_ITEMS.filter((item) => rolesAllow(user.roles, item.action));
  const roleText = user.roles.map((r) => ROLE_LABELS[r]).join(", ") || "no roles";
  return (
    <SessionProvider>
      <header className="sticky top-0 z-20 border-b border-line bg-panel/95 backdrop-blur">
        <div className="mx-auto flex max-w-[1440px] flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2">
          <a href="/" className="text-lg font-semibold tracking-tight">
            Deep<span className="text-accent">shift</span>
          </a>
          <NavLinks items={items} />
          <div className="ml-auto flex items-center gap-3">
            <UtcClock />
            <ThemeToggle initial={theme} />
            <span className="text-sm" data-testid="who" title={roleText}>
              {user.name}
              <span className="ml-1 text-xs text-muted">({user.roles.length > 1 ? `${user.roles.length} roles` : roleText})</span>
            </span>
            <SignOutButton />
          </div>
        </div>
      </header>
      <main className="mx-auto max-w-[1440px] px-4 py-5">{children}</main>
    </SessionProvider>
  );
}
