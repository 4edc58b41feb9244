import Link from "next/link";
import { notFound } from "next/navigation";
import { getPeriod } from "@/db/periods";
import { requireRole } from "@/lib/auth/guards";
import { formatUtcInput } from "@/components/quality/utc-input";
import { PeriodForm } from "../../PeriodForm";

export const metadata = { title: "Edit period" };
export const dynamic = "force-dynamic";

export default async function EditPeriodPage({ params }: { params: Promise<{ id: string }> }) {
  await requireRole("periods.manage");
  const id = Number((await params).id);
  const period = Number.isInteger(id) && id > 0 ? await getPeriod(id) : null;
  if (!period) notFound();
  return (
    <section className="space-y-3">
      <p className="text-sm"><Link href={`/exposure/${period.id}`} className="text-accent hover:underline">← {period.name}</Link></p>
      <h1 className="text-xl font-semibold">Edit period</h1>
      <PeriodForm
        defaults={{
          id: period.id,
          name: period.name,
          startAt: formatUtcInput(period.startAt.getTime()),
          endAt: formatUtcInput(period.endAt.getTime()),
          runTypes: period.runTypes,
          detector: period.detector ?? "",
          signalAcceptance: String(period.signalAcceptance),
          notes: period.notes ?? "",
          blind: period.blind,
        }}
      />
    </section>
  );
}
