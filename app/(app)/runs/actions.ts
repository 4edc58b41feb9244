"use server";
/**
 * The shift crew's and experts' run forms. They turn the form into the same request objects the DAQ sends and go
 * through the same parsing, rules and database code as the API, so a run opened here obeys exactly the same checks.
 */
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { openRun, closeRun } from "@/db/run-writes";
import { createConfig } from "@/db/configs";
import { requireRole } from "@/lib/auth/guards";
import {
  conditionsFromText,
  numberFromFormInput,
  parseCloseRequest,
  parseConfigRequest,
  parseOpenRequest,
  RunConflictError,
  RunInputError,
  RunNotFoundError,
  utcFromFormInput,
} from "@/lib/runs";

/** What a run form shows after a submission: the problem (and its field), or what was done, plus the values typed. */
export type RunFormState = { error?: string; field?: string; done?: string; values?: Record<string, string>; attempt?: number };

function textOf(form: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  form.forEach((v, k) => {
    if (typeof v === "string") out[k] = v;
  });
  return out;
}

function failure(err: unknown, values: Record<string, string>, prev: RunFormState): RunFormState {
  const attempt = (prev.attempt ?? 0) + 1;
  if (err instanceof RunInputError) return { error: err.message, field: err.field, values, attempt };
  if (err instanceof RunConflictError || err instanceof RunNotFoundError) return { error: err.message, values, attempt };
  throw err;
}

/** Open a run from the form; on success go to its page. */
export async function openRunAction(prev: RunFormState, form: FormData): Promise<RunFormState> {
  const user = await requireRole("runs.write");
  const v = textOf(form);
  let number: number;
  try {
    const input = parseOpenRequest({
      number: numberFromFormInput(v.number ?? ""),
      type: v.type || undefined,
      start: utcFromFormInput(v.start ?? ""),
      detector: v.detector || undefined,
      targetMassOverrideKg: v.targetMassOverrideKg?.trim() || undefined,
      conditions: conditionsFromText(v.conditions ?? ""),
    });
    const { run, changed } = await openRun({ userId: user.id }, input);
    if (!changed) return { error: `run ${run.number} was already open with these values`, values: v, attempt: (prev.attempt ?? 0) + 1 };
    number = run.number;
  } catch (err) {
    return failure(err, v, prev);
  }
  revalidatePath("/runs");
  redirect(`/runs/${number}`);
}

/** Close a run from its page. */
export async function closeRunAction(prev: RunFormState, form: FormData): Promise<RunFormState> {
  const user = await requireRole("runs.write");
  const v = textOf(form);
  const number = Number(v.runNumber);
  try {
    const input = parseCloseRequest({
      end: utcFromFormInput(v.end ?? ""),
      liveSeconds: numberFromFormInput(v.liveSeconds ?? ""),
      deadSeconds: numberFromFormInput(v.deadSeconds ?? ""),
      triggerCount: numberFromFormInput(v.triggerCount ?? ""),
      status: v.status || undefined,
    });
    await closeRun({ userId: user.id }, number, input);
  } catch (err) {
    return failure(err, v, prev);
  }
  revalidatePath(`/runs/${number}`);
  revalidatePath("/runs");
  return { done: `Run ${number} closed.`, attempt: (prev.attempt ?? 0) + 1 };
}

/** Add a detector configuration (detector experts). */
export async function createConfigAction(prev: RunFormState, form: FormData): Promise<RunFormState> {
  const user = await requireRole("configs.manage");
  const v = textOf(form);
  try {
    const input = parseConfigRequest({
      detector: v.detector || undefined,
      name: v.name,
      targetMaterial: v.targetMaterial,
      fiducialMassKg: v.fiducialMassKg?.trim() || undefined,
      effectiveFrom: utcFromFormInput(v.effectiveFrom ?? ""),
      notes: v.notes?.trim() || null,
    });
    const { reassignedRuns } = await createConfig({ userId: user.id }, input);
    revalidatePath("/runs/configs");
    const moved = reassignedRuns === 1 ? "1 recorded run now takes it" : `${reassignedRuns} recorded runs now take it`;
    return { done: `Configuration “${input.name}” added; ${moved}.`, attempt: (prev.attempt ?? 0) + 1 };
  } catch (err) {
    return failure(err, v, prev);
  }
}
