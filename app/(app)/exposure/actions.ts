"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { requireRole } from "@/lib/auth/guards";
import { createPeriod, PeriodRequestError, updatePeriod } from "@/db/periods";
import { firstIssue, periodCreateSchema, periodPatchSchema } from "@/components/quality/inputs";
import { parseUtcInput, UtcInputError } from "@/components/quality/utc-input";

/** What the period form shows after submitting. */
export type PeriodFormState = { error?: string; field?: string };

function text(form: FormData, key: string): string {
  const v = form.get(key);
  return typeof v === "string" ? v : "";
}

/** The form's fields in the API's shape (times typed as UTC become ISO strings). */
function fromForm(form: FormData) {
  const acceptance = text(form, "signalAcceptance").trim();
  return {
    name: text(form, "name"),
    startAt: new Date(parseUtcInput(text(form, "startAt"), "startAt")).toISOString(),
    endAt: new Date(parseUtcInput(text(form, "endAt"), "endAt")).toISOString(),
    runTypes: form.getAll("runTypes").filter((v): v is string => typeof v === "string"),
    detector: text(form, "detector").trim() || null,
    signalAcceptance: acceptance === "" ? Number.NaN : Number(acceptance),
    notes: text(form, "notes").trim() || null,
    blind: form.get("blind") === "on",
  };
}

const LABELS: Record<string, string> = {
  name: "Name", startAt: "Start (UTC)", endAt: "End (UTC)", runTypes: "Run types", detector: "Detector", signalAcceptance: "Signal acceptance", notes: "Notes", blind: "Blind",
};

/** The first problem in the form's words: "End (UTC): must be after the start". */
function issue(error: Parameters<typeof firstIssue>[0]): PeriodFormState {
  const { error: text, field } = firstIssue(error);
  const top = field.split(".")[0] ?? field;
  return { error: text.replace(`${field}:`, `${LABELS[top] ?? field}:`), field };
}

function refusal(err: unknown): PeriodFormState {
  if (err instanceof UtcInputError) return { error: `${LABELS[err.field] ?? err.field}: ${err.reason}`, field: err.field };
  if (err instanceof PeriodRequestError) return { error: err.message, field: err.field };
  throw err;
}

/** Create a data-quality period, then open its exposure page. */
export async function createPeriodAction(_prev: PeriodFormState, form: FormData): Promise<PeriodFormState> {
  const user = await requireRole("periods.manage");
  let id: number;
  try {
    const parsed = periodCreateSchema.safeParse(fromForm(form));
    if (!parsed.success) return issue(parsed.error);
    id = (await createPeriod(user.id, parsed.data)).id;
  } catch (err) {
    return refusal(err);
  }
  revalidatePath("/exposure");
  redirect(`/exposure/${id}`);
}

/** Change a period's definition, then go back to its exposure page. */
export async function updatePeriodAction(_prev: PeriodFormState, form: FormData): Promise<PeriodFormState> {
  const user = await requireRole("periods.manage");
  const id = Number(form.get("id"));
  if (!Number.isInteger(id) || id <= 0) return { error: "Unknown period.", field: "id" };
  try {
    const fields = fromForm(form);
    // A blind period's checkbox is shown disabled (so not sent); leave blind untouched then.
    const patch = form.get("blindLocked") === "true" ? { ...fields, blind: undefined } : fields;
    const parsed = periodPatchSchema.safeParse(patch);
    if (!parsed.success) return issue(parsed.error);
    await updatePeriod(user.id, id, parsed.data);
  } catch (err) {
    return refusal(err);
  }
  revalidatePath("/exposure");
  revalidatePath(`/exposure/${id}`);
  redirect(`/exposure/${id}`);
}
