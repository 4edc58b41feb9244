import { Caution } from "@/components/ui/Caution";
import { SafetyTabs, type SafetyTab } from "@/components/safety/SafetyTabs";
import { requireUser } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";

/** Every safety page: the caution first, then the area's tabs (the review queue only for those who work it). */
export default async function SafetyLayout({ children }: { children: React.ReactNode }) {
  const user = await requireUser();
  const tabs: SafetyTab[] = [
    ...(rolesAllow(user.roles, "safety.review") ? [{ href: "/safety", label: "Review queue" }] : []),
    { href: "/safety/sources", label: "Calibration sources" },
    { href: "/safety/oxygen", label: "Oxygen-deficiency estimate" },
  ];
  return (
    <section>
      <Caution />
      <SafetyTabs tabs={tabs} />
      {children}
    </section>
  );
}
