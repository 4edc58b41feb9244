"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { CountingRequestError, recordCounting } from "@/db/limits";
import { requireRole } from "@/lib/auth/guards";
import { countingPatchFromForm } from "@/components/limits/inputs";
import type { RecordState } from "@/components/limits/RecordForm";


function text(form: FormData, name: string): string | undefined {
  const v = form.get(name);
  return typeof v === "string" ? v : undefined;
}

/** Records n (not while blind), b with its note, and the quoted CL and method of one period; audited. */
export async function recordCountingAction(_prev: RecordState, form: FormData): Promise<RecordState> {
  const user = await requireRole("limits.record");
  const periodId = z.coerce.number().int().positive().safeParse(form.get("periodId"));
  if (!periodId.success) return { error: "Pick a period first.", field: "periodId" };
  const read = countingPatchFromForm({
    observed: text(form, "observed"),
    background: text(form, "background"),
    backgroundNote: text(form, "backgroundNote"),
    clPercent: text(form, "clPercent"),
    method: text(form, "method"),
  });
  if (!read.ok) return { error: `${read.field}: ${read.reason}`, field: read.field };
  try {
    const saved = await recordCounting(user.id, periodId.data, read.patch);
    revalidatePath("/limits");
    return { saved: `Recorded for ${saved.name}.` };
  } catch (err) {
    if (err instanceof CountingRequestError) return { error: err.message, field: err.field };
    throw err;
  }
}
