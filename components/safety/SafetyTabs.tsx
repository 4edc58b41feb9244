"use client";
import { usePathname } from "next/navigation";
import { SubTabs, type SubTab } from "@/components/ui/SubTabs";

export type SafetyTab = SubTab;

/** Sub-navigation of the safety area; the server decides which tabs this person may see. */
export function SafetyTabs({ tabs }: { tabs: SafetyTab[] }) {
  const path = usePathname();
  // The queue tab also covers the review item pages under /safety/reviews.
  const isCurrent = (href: string) => (href === "/safety" ? path === "/safety" || path.startsWith("/safety/reviews") : path.startsWith(href));
  return <SubTabs tabs={tabs} current={tabs.find((t) => isCurrent(t.href))?.href ?? ""} label="Safety" />;
}
