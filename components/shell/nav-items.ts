/** The areas of Deepshift; each is shown to whoever the permission table lets perform its action. */
import type { Action } from "@/lib/auth/permissions";

export type NavItem = { href: string; label: string; action: Action; glyph: string };

export const NAV_ITEMS: NavItem[] = [
  { href: "/runs", label: "Runs", action: "runs.read", glyph: "▶" },
  { href: "/logbook", label: "Logbook", action: "entries.read", glyph: "✎" },
  { href: "/quality", label: "Data quality", action: "flags.read", glyph: "⚑" },
  { href: "/exposure", label: "Exposure", action: "periods.read", glyph: "Σ" },
  { href: "/limits", label: "Limits", action: "periods.read", glyph: "≤" },
  { href: "/safety", label: "Safety", action: "sources.read", glyph: "⚠" },
  { href: "/admin", label: "Admin", action: "admin.users", glyph: "⚙" },
];
