"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "./nav-items";

/** The navigation links the server decided this user may see; the current area is marked. */
export function NavLinks({ items }: { items: NavItem[] }) {
  const path = usePathname();
  return (
    <nav aria-label="Areas" className="flex flex-wrap gap-1">
      {items.map((item) => {
        const current = path === item.href || path.startsWith(`${item.href}/`);
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={current ? "page" : undefined}
            className={`rounded px-3 py-1.5 text-sm ${current ? "bg-raised font-medium text-ink" : "text-muted hover:bg-raised/60 hover:text-ink"}`}
          >
            <span aria-hidden className="mr-1.5 font-mono text-xs">{item.glyph}</span>
            {item.label}
          </Link>
        );
      })}
    </nav>
  );
}
