import Link from "next/link";
import { requireRole } from "@/lib/auth/guards";
import { PeriodForm } from "../PeriodForm";

export const metadata = { title: "New period" };
export const dynamic = "force-dynamic";

export default async function NewPeriodPage() {
  await requireRole("periods.manage");
  return (
    <section className="space-y-3">
      <p className="text-sm"><Link href="/exposure" className="text-accent hover:underline">← Exposure</Link></p>
      <h1 className="text-xl font-semibold">New data-quality period</h1>
      <p className="text-sm text-muted">Exposure is computed from the runs of the chosen types inside the span, minus confirmed excluding flags.</p>
      <PeriodForm defaults={{ name: "", startAt: "", endAt: "", runTypes: ["science"], detector: "Quillon", signalAcceptance: "", notes: "", blind: false }} />
    </section>
  );
}
