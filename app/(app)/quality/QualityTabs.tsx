import Link from "next/link";

const TABS = [
  { href: "/quality", label: "Flags" },
  { href: "/quality/subsystems", label: "Subsystems" },
];

/** Sub-navigation of the data-quality area. */
export function QualityTabs({ current }: { current: string }) {
  return (
    <div className="mb-4 flex gap-2 border-b border-line">
      {TABS.map((t) => (
        <Link key={t.href} href={t.href} aria-current={t.href === current ? "page" : undefined} className={`-mb-px border-b-2 px-3 py-2 text-sm ${t.href === current ? "border-accent text-ink" : "border-transparent text-muted hover:text-ink"}`}>
          {t.label}
        </Link>
      ))}
    </div>
  );
}
