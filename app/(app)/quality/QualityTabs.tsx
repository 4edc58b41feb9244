import { SubTabs } from "@/components/ui/SubTabs";

const TABS = [
  { href: "/quality", label: "Flags" },
  { href: "/quality/subsystems", label: "Subsystems" },
];

/** Sub-navigation of the data-quality area. */
export function QualityTabs({ current }: { current: string }) {
  return <SubTabs tabs={TABS} current={current} label="Data quality" />;
}
