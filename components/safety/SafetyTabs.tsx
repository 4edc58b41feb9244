"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export type SafetyTab = { href: string; label: string };

/** Sub-navigation of the safety area; the server decides which tabs this person may see. */
export function SafetyTabs({ tabs }: { tabs: SafetyTab[] }) {
  const path = usePathname();
  const current = (href: string) => (href === "/safety" ? path === "/safety" || path.startsWith("/safety/reviews") : path.startsWith(href));
  return (
    <nav aria-label="Safety" className="mb-4 flex gap-2 border-b border-line">
      {tabs.map((t) => (
        <Link
          key={t.href}
          href={t.href}
          aria-current={current(t.href) ? "page" : undefined}
          className={`-mb-px border-b-2 px-3 py-2 text-sm ${current(t.href) ? "border-accent text-ink" : "border-transparent text-muted hover:text-ink"}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
