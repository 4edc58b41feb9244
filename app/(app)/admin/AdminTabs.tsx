import { SubTabs } from "@/components/ui/SubTabs";

const TABS = [
  { href: "/admin", label: "People and roles" },
  { href: "/admin/tokens", label: "Machine tokens" },
  { href: "/admin/audit", label: "Audit trail" },
];

/** Sub-navigation of the admin area. */
export function AdminTabs({ current }: { current: string }) {
  return <SubTabs tabs={TABS} current={current} label="Admin" />;
}
