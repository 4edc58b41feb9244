import { requireUser } from "@/lib/auth/guards";
import { OxygenForm } from "@/components/safety/OxygenForm";

export const metadata = { title: "Oxygen-deficiency estimate" };

// Open to every signed-in person: anyone handling cryogens may want the estimate before a fill or transfer.
export default async function OxygenPage() {
  await requireUser();
  return (
    <div>
      <h1 className="mb-1 text-xl font-semibold">Oxygen-deficiency estimate</h1>
      <p className="mb-4 max-w-3xl text-sm text-muted">
        How low could the oxygen go if this much cryogen boiled off into this room? Three limiting assumptions bracket what the room air does;
        the lowest is the worst case. This is an estimate for planning, not an oxygen-deficiency hazard assessment: the laboratory&apos;s own assessment, its
        oxygen monitors and its rules decide.
      </p>
      <OxygenForm />
    </div>
  );
}
