import { SubTabs } from "@/components/ui/SubTabs";

const TABS = [
  { href: "/runs", label: "Runs" },
  { href: "/runs/configs", label: "Detector configurations" },
];

/** Sub-navigation of the runs area. */
export function RunsTabs({ current }: { current: string }) {
  return <SubTabs tabs={TABS} current={current} label="Runs" />;
}
