"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { moveReview, ReviewNotFoundError } from "@/db/safety";
import { checkOut, createSource, existingRunNumbers, recordLeakTest, returnSource, setCheckoutRuns, SourceError, updateSource } from "@/db/sources";
import { requireRole } from "@/lib/auth/guards";
import { notifyFollowUp } from "@/lib/server/safety-jobs";
import { ReviewMoveError } from "@/components/safety/review-flow";
import { checkoutSchema, leakTestSchema, newSourceSchema, returnSchema, sourceChangesSchema } from "@/app/api/sources/schemas";

/** What a safety form shows after submitting: an error naming the field, or a short confirmation. */
export type FormState = { error?: string; field?: string; done?: string; id?: number };

// FormData sends "" for an empty field; optional fields should then be absent, not "".
function fields(form: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of form.entries()) if (typeof v === "string" && v.trim() !== "") out[k] = v;
  return out;
}

function runList(text: string | undefined): number[] | string {
  if (!text) return [];
  const parts = text.split(/[\s,;]+/).filter(Boolean);
  const nums = parts.map(Number);
  const bad = parts.find((_p, i) => !Number.isSafeInteger(nums[i]) || (nums[i] ?? 0) <= 0);
  return bad === undefined ? nums : `"${bad}" is not a run number`;
}

function zodState(err: z.ZodError): FormState {
  const issue = err.issues[0];
  const field = issue?.path.map(String).join(".") || undefined;
  return { error: issue?.message ?? "check the form", ...(field ? { field } : {}) };
}

async function unknownRuns(numbers: number[]): Promise<FormState | null> {
  const existing = await existingRunNumbers(numbers);
  const missing = numbers.filter((n) => !existing.includes(n));
  return missing.length ? { error: `no run ${missing.join(", ")}`, field: "runNumbers" } : null;
}

/** A safety officer moves a queue item with a comment; asking for follow-up mails the writer. */
export async function moveReviewAction(_prev: FormState, form: FormData): Promise<FormState> {
  const officer = await requireRole("safety.review");
  const reviewId = Number(form.get("reviewId"));
  try {
    const moved = await moveReview({ userId: officer.id }, reviewId, form.get("to"), form.get("comment"));
    if (moved.to === "follow_up") await notifyFollowUp(reviewId, officer.name, moved.comment);
    revalidatePath("/safety");
    revalidatePath(`/safety/reviews/${reviewId}`);
    return { done: moved.to };
  } catch (err) {
    if (err instanceof ReviewMoveError) return { error: err.message, field: err.field };
    if (err instanceof ReviewNotFoundError) return { error: err.message };
    throw err;
  }
}

/** A safety officer adds a source to the inventory. */
export async function createSourceAction(_prev: FormState, form: FormData): Promise<FormState> {
  const officer = await requireRole("sources.manage");
  const parsed = newSourceSchema.safeParse(fields(form));
  if (!parsed.success) return zodState(parsed.error);
  try {
    const id = await createSource({ userId: officer.id }, parsed.data);
    revalidatePath("/safety/sources");
    return { done: `Added ${parsed.data.nuclide} ${parsed.data.serial}.`, id };
  } catch (err) {
    if (err instanceof SourceError) return { error: err.message, field: err.field };
    throw err;
  }
}

/** Check a source out (now, or at an earlier time when recorded afterwards), with the runs it serves. */
export async function checkoutAction(_prev: FormState, form: FormData): Promise<FormState> {
  const person = await requireRole("sources.checkout");
  const f = fields(form);
  const sourceId = Number(f.sourceId);
  const runNumbers = runList(f.runNumbers);
  if (typeof runNumbers === "string") return { error: runNumbers, field: "runNumbers" };
  const parsed = checkoutSchema.safeParse({ ...f, runNumbers });
  if (!parsed.success) return zodState(parsed.error);
  const unknown = await unknownRuns(parsed.data.runNumbers);
  if (unknown) return unknown;
  try {
    await checkOut({ userId: person.id }, sourceId, { at: parsed.data.checkedOutAt ?? new Date(), purpose: parsed.data.purpose, runNumbers: parsed.data.runNumbers });
    revalidatePath(`/safety/sources/${sourceId}`);
    revalidatePath("/safety/sources");
    return { done: "Checked out." };
  } catch (err) {
    if (err instanceof SourceError) return { error: err.message, field: err.field };
    throw err;
  }
}

/** Return a checked-out source. */
export async function returnAction(_prev: FormState, form: FormData): Promise<FormState> {
  const person = await requireRole("sources.checkout");
  const f = fields(form);
  const parsed = returnSchema.safeParse(f);
  if (!parsed.success) return zodState(parsed.error);
  try {
    await returnSource({ userId: person.id }, Number(f.checkoutId), parsed.data.returnedAt ?? new Date());
    revalidatePath(`/safety/sources/${f.sourceId}`);
    revalidatePath("/safety/sources");
    return { done: "Returned." };
  } catch (err) {
    if (err instanceof SourceError) return { error: err.message, field: err.field };
    throw err;
  }
}

/** Replace the calibration runs a checkout served. */
export async function setRunsAction(_prev: FormState, form: FormData): Promise<FormState> {
  const person = await requireRole("sources.checkout");
  const f = fields(form);
  const runNumbers = runList(f.runNumbers);
  if (typeof runNumbers === "string") return { error: runNumbers, field: "runNumbers" };
  const unknown = await unknownRuns(runNumbers);
  if (unknown) return unknown;
  try {
    await setCheckoutRuns({ userId: person.id }, Number(f.checkoutId), runNumbers);
    revalidatePath(`/safety/sources/${f.sourceId}`);
    return { done: "Runs linked." };
  } catch (err) {
    if (err instanceof SourceError) return { error: err.message, field: err.field };
    throw err;
  }
}

/** A safety officer records a leak (wipe) test of a sealed source. */
export async function leakTestAction(_prev: FormState, form: FormData): Promise<FormState> {
  const officer = await requireRole("sources.manage");
  const f = fields(form);
  const parsed = leakTestSchema.safeParse(f);
  if (!parsed.success) return zodState(parsed.error);
  try {
    await recordLeakTest({ userId: officer.id }, Number(f.sourceId), parsed.data.testedAt, parsed.data.result);
    revalidatePath(`/safety/sources/${f.sourceId}`);
    revalidatePath("/safety/sources");
    return { done: "Leak test recorded." };
  } catch (err) {
    if (err instanceof SourceError) return { error: err.message, field: err.field };
    throw err;
  }
}

/** A safety officer changes a source's location, custodian, allowance, intervals or notes. */
export async function updateSourceAction(_prev: FormState, form: FormData): Promise<FormState> {
  const officer = await requireRole("sources.manage");
  const raw = Object.fromEntries([...form.entries()].filter(([k, v]) => k !== "sourceId" && typeof v === "string"));
  // An empty custodian or notes field clears it; empty numeric fields leave the value as it is.
  const input: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(raw)) {
    const text = String(v).trim();
    if (k === "custodianId" || k === "notes") input[k] = text === "" ? null : text;
    else if (text !== "") input[k] = text;
  }
  const parsed = sourceChangesSchema.safeParse(input);
  if (!parsed.success) return zodState(parsed.error);
  const changes = Object.fromEntries(Object.entries(parsed.data).filter(([, v]) => v !== undefined));
  try {
    await updateSource({ userId: officer.id }, Number(form.get("sourceId")), changes);
    revalidatePath(`/safety/sources/${String(form.get("sourceId"))}`);
    revalidatePath("/safety/sources");
    return { done: "Saved." };
  } catch (err) {
    if (err instanceof SourceError) return { error: err.message, field: err.field };
    throw err;
  }
}
