/** Input shapes of the calibration-source routes (also used by the source pages' server actions). */
import { z } from "zod";
import { getNuclide } from "@/lib/safety/nuclides";
import { SOURCE_FORMS } from "@/db/schema";

const MAX_FUTURE_MS = 5 * 60_000;

/** A UTC instant given as ISO 8601 text ("2024-06-01" or "2024-06-01T09:00:00Z"). */
export const isoInstant = z
  .string("give a date as ISO 8601 text, e.g. 2024-06-01T09:00:00Z")
  .trim()
  .refine((s) => /^\d{4}-\d{2}-\d{2}/.test(s) && !Number.isNaN(Date.parse(s)), "give a date as ISO 8601 text, e.g. 2024-06-01T09:00:00Z")
  .transform((s) => new Date(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?$/.test(s) ? `${s}Z` : s));

/** An instant that is not in the future (a few minutes of clock skew allowed). */
export const pastInstant = isoInstant.refine((d) => d.getTime() <= Date.now() + MAX_FUTURE_MS, "cannot be in the future");

const optionalText = (max: number) => z.string().trim().max(max).optional().transform((s) => (s ? s : null));

export const newSourceSchema = z
  .object({
    nuclide: z.string("pick a nuclide from the built-in table").trim().min(1, "pick a nuclide from the built-in table"),
    serial: z.string("enter the serial").trim().min(1, "enter the serial").max(60),
    form: z.enum(SOURCE_FORMS, "sealed or gaseous").optional(),
    referenceActivityBq: z.coerce.number("the certificate activity in Bq").positive("must be greater than zero").finite(),
    referenceDate: isoInstant,
    location: z.string("where the source is kept").trim().min(1, "where the source is kept").max(120),
    custodianId: z.coerce.number().int().positive().optional(),
    allowedOutHours: z.coerce.number("hours the source may be out").positive("must be greater than zero").max(24 * 365),
    leakTestIntervalMonths: z.coerce.number().int("whole months").min(1).max(120).optional(),
    lastLeakTestAt: pastInstant.optional(),
    decayWaitFraction: z.coerce.number().gt(0, "must be between 0 and 1").max(1, "must be between 0 and 1").optional(),
    notes: optionalText(2000),
  })
  .transform((v, ctx) => {
    let nuclideId: string;
    try {
      nuclideId = getNuclide(v.nuclide).id;
    } catch {
      ctx.addIssue({ code: "custom", path: ["nuclide"], message: `"${v.nuclide}" is not in the built-in nuclide table` });
      return z.NEVER;
    }
    const form = v.form ?? getNuclide(nuclideId).form;
    return {
      nuclide: nuclideId,
      serial: v.serial,
      form,
      referenceActivityBq: v.referenceActivityBq,
      referenceDate: v.referenceDate,
      location: v.location,
      custodianId: v.custodianId ?? null,
      allowedOutHours: v.allowedOutHours,
      // Sealed sources get the common six-month leak-test interval unless told otherwise; gaseous ones none.
      leakTestIntervalMonths: form === "sealed" ? (v.leakTestIntervalMonths ?? 6) : null,
      lastLeakTestAt: form === "sealed" ? (v.lastLeakTestAt ?? null) : null,
      decayWaitFraction: form === "gaseous" ? (v.decayWaitFraction ?? 0.001) : null,
      notes: v.notes,
    };
  });

export const checkoutSchema = z.object({
  purpose: z.string("say what the source is for").trim().min(1, "say what the source is for").max(200),
  checkedOutAt: pastInstant.optional(),
  runNumbers: z.array(z.coerce.number().int().positive("run numbers are positive whole numbers")).max(200).default([]),
});

export const returnSchema = z.object({ returnedAt: pastInstant.optional() });
export const runsSchema = z.object({ runNumbers: z.array(z.coerce.number().int().positive("run numbers are positive whole numbers")).max(200) });
export const leakTestSchema = z.object({
  testedAt: pastInstant,
  result: z.string().trim().max(300).optional().transform((s) => s || "passed"),
});

/** PATCH body: any of the details that may change; an empty custodian or notes clears it. */
export const sourceChangesSchema = z
  .object({
    location: z.string().trim().min(1, "where the source is kept").max(120).optional(),
    custodianId: z.union([z.coerce.number().int().positive(), z.null()]).optional(),
    allowedOutHours: z.coerce.number().positive("must be greater than zero").max(24 * 365).optional(),
    leakTestIntervalMonths: z.union([z.coerce.number().int("whole months").min(1).max(120), z.null()]).optional(),
    decayWaitFraction: z.coerce.number().gt(0, "must be between 0 and 1").max(1, "must be between 0 and 1").optional(),
    notes: z.union([z.string().trim().max(2000), z.null()]).optional().transform((s) => (s === "" ? null : s)),
  })
  .strict();
