import Link from "next/link";

export type SubTab = { href: string; label: string };

/** The sub-navigation strip of an area; `current` is the href of the tab being shown. */
export function SubTabs({ tabs, current, label }: { tabs: readonly SubTab[]; current: string; label: string }) {
  return (
    <nav aria-label={label} className="mb-4 flex gap-2 border-b border-line">
      {tabs.map((t) => (
        <Link
          key={t.href}
          href={t.href}
          aria-current={t.href === current ? "page" : undefined}
          className={`-mb-px border-b-2 px-3 py-2 text-sm ${t.href === current ? "border-accent text-ink" : "border-transparent text-muted hover:text-ink"}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
