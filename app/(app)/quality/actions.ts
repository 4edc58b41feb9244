"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { requireRole } from "@/lib/auth/guards";
import { confirmFlag, createSubsystem, FlagRequestError, listFlags, proposeFlag, setSubsystemActive, withdrawFlag } from "@/db/flags";
import { runForTimeline } from "@/db/exposure";
import { FlagStepError } from "@/components/quality/flag-rules";
import { firstIssue, flagConfirmSchema, flagProposalSchema, flagWithdrawSchema, subsystemSchema } from "@/components/quality/inputs";
import { parseUtcInput, UtcInputError } from "@/components/quality/utc-input";
import type { TimelineFlag } from "@/components/quality/RunTimeline";

/** What a form shows after submitting: an error naming the field, or what was done. */
export type FormState = { error?: string; field?: string; done?: string; flagId?: number };

const LABELS: Record<string, string> = { startAt: "Start (UTC)", endAt: "End (UTC)", subsystem: "Subsystem", verdict: "Verdict", reason: "Reason", code: "Code", label: "Name", comment: "Comment" };

/** The first problem in the form's words: "End (UTC): must be after the start". */
function issue(error: Parameters<typeof firstIssue>[0]): FormState {
  const { error: text, field } = firstIssue(error);
  return { error: text.replace(`${field}:`, `${LABELS[field] ?? field}:`), field };
}

function refusal(err: unknown): FormState {
  if (err instanceof FlagStepError || err instanceof FlagRequestError) return { error: err.message, field: err.field };
  if (err instanceof UtcInputError) return { error: `${LABELS[err.field] ?? err.field}: ${err.reason}`, field: err.field };
  throw err;
}

function text(form: FormData, key: string): string {
  const v = form.get(key);
  return typeof v === "string" ? v : "";
}

export type TimelineResult = { run: { number: number; startMs: number; endMs: number; open: boolean }; flags: TimelineFlag[] } | { error: string };

/** A run's span and the flags overlapping it, for the timeline picker. */
export async function runTimelineAction(runNumber: number): Promise<TimelineResult> {
  await requireRole("flags.read");
  if (!Number.isInteger(runNumber) || runNumber <= 0) return { error: "Type a run number (a positive whole number)." };
  const run = await runForTimeline(runNumber);
  if (!run) return { error: `No run numbered ${runNumber}.` };
  const startMs = run.startAt.getTime();
  const endMs = run.endAt?.getTime() ?? Math.max(Date.now(), startMs + 1000);
  const flags = await listFlags({ states: ["proposed", "confirmed"], fromMs: startMs, toMs: endMs, limit: 500 });
  return {
    run: { number: run.number, startMs, endMs, open: run.endAt === null },
    flags: flags.map((f) => ({ id: f.id, startMs: f.startAt.getTime(), endMs: f.endAt.getTime(), verdict: f.verdict, state: f.state, subsystemLabel: f.subsystemLabel })),
  };
}

/** Propose a bad-time flag from the form (start and end typed as UTC). */
export async function proposeFlagAction(_prev: FormState, form: FormData): Promise<FormState> {
  const user = await requireRole("flags.manage");
  try {
    const startAt = new Date(parseUtcInput(text(form, "startAt"), "startAt")).toISOString();
    const endAt = new Date(parseUtcInput(text(form, "endAt"), "endAt")).toISOString();
    const parsed = flagProposalSchema.safeParse({
      startAt, endAt, subsystem: text(form, "subsystem"), verdict: text(form, "verdict"), reason: text(form, "reason"),
    });
    if (!parsed.success) return issue(parsed.error);
    const flag = await proposeFlag(user.id, parsed.data);
    revalidatePath("/quality");
    return { done: `Flag ${flag.id} proposed. Another detector expert must now confirm it.`, flagId: flag.id };
  } catch (err) {
    return refusal(err);
  }
}

const idSchema = z.coerce.number().int().positive();

/** Confirm a proposed flag (refused for its proposer: two-person rule). */
export async function confirmFlagAction(_prev: FormState, form: FormData): Promise<FormState> {
  const user = await requireRole("flags.manage");
  const id = idSchema.safeParse(form.get("id"));
  if (!id.success) return { error: "Unknown flag.", field: "id" };
  const body = flagConfirmSchema.safeParse({ comment: text(form, "comment") || undefined });
  if (!body.success) return issue(body.error);
  try {
    await confirmFlag(user.id, id.data, body.data.comment);
  } catch (err) {
    return refusal(err);
  }
  revalidatePath("/quality");
  revalidatePath(`/quality/flags/${id.data}`);
  return { done: `Flag ${id.data} confirmed.`, flagId: id.data };
}

/** Withdraw a flag with a reason. */
export async function withdrawFlagAction(_prev: FormState, form: FormData): Promise<FormState> {
  const user = await requireRole("flags.manage");
  const id = idSchema.safeParse(form.get("id"));
  if (!id.success) return { error: "Unknown flag.", field: "id" };
  const body = flagWithdrawSchema.safeParse({ reason: text(form, "reason") });
  if (!body.success) return issue(body.error);
  try {
    await withdrawFlag(user.id, id.data, body.data.reason);
  } catch (err) {
    return refusal(err);
  }
  revalidatePath("/quality");
  revalidatePath(`/quality/flags/${id.data}`);
  return { done: `Flag ${id.data} withdrawn.`, flagId: id.data };
}

/** Add a subsystem. */
export async function createSubsystemAction(_prev: FormState, form: FormData): Promise<FormState> {
  const user = await requireRole("flags.manage");
  const parsed = subsystemSchema.safeParse({ code: text(form, "code"), label: text(form, "label") });
  if (!parsed.success) return issue(parsed.error);
  try {
    await createSubsystem(user.id, parsed.data);
  } catch (err) {
    return refusal(err);
  }
  revalidatePath("/quality/subsystems");
  return { done: `Subsystem "${parsed.data.label}" added.` };
}

/** Activate or deactivate a subsystem. */
export async function setSubsystemActiveAction(form: FormData): Promise<void> {
  const user = await requireRole("flags.manage");
  const code = z.string().min(1).parse(form.get("code"));
  await setSubsystemActive(user.id, code, form.get("active") === "true");
  revalidatePath("/quality/subsystems");
}
