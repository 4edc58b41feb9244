/**
 * The shapes of an entry as the form holds it and as the API accepts it (zod), shared by the browser and the server
 * so both refuse the same things with the same words.
 */
import { z } from "zod";
import { ENTRY_CATEGORIES } from "@/db/schema/logbook";
import { LogbookInputError } from "@/lib/logbook/errors";
import { MAX_BODY_CHARS, MAX_TITLE_CHARS, normaliseTags, parseRunNumbers } from "@/lib/logbook/entry-input";

const category = z.enum(ENTRY_CATEGORIES, { error: "Pick a category" });
const title = z.string().trim().min(1, "Give the entry a title").max(MAX_TITLE_CHARS, `Keep the title under ${MAX_TITLE_CHARS} characters`);
const body = z.string().max(MAX_BODY_CHARS, `The text is longer than ${MAX_BODY_CHARS} characters`);

/** Run a parser that throws LogbookInputError inside zod, turning its reason into an issue. */
function parsed<T>(parse: (v: never) => T) {
  return (value: unknown, ctx: z.RefinementCtx): T => {
    try {
      return parse(value as never);
    } catch (err) {
      if (err instanceof LogbookInputError) {
        ctx.addIssue({ code: "custom", message: err.message });
        return z.NEVER;
      }
      throw err;
    }
  };
}

const tagsIn = z.union([z.string(), z.array(z.string())]).transform(parsed(normaliseTags));
const runsIn = z.union([z.string(), z.array(z.union([z.number(), z.string()]))]).transform(parsed(parseRunNumbers));

/** POST /api/entries body. */
export const createEntrySchema = z.object({
  category,
  title,
  body: body.default(""),
  tags: tagsIn.default([]),
  runNumbers: runsIn.default([]),
  needsSafetyReview: z.boolean().default(false),
});

/** PUT /api/entries/{id} body. */
export const reviseEntrySchema = z.object({
  baseRevision: z.number({ error: "baseRevision (the revision you edited) is required" }).int().min(1),
  category: category.optional(),
  title,
  body,
  tags: tagsIn.default([]),
  runNumbers: runsIn.default([]),
  needsSafetyReview: z.boolean().optional(),
});

/** POST /api/entries/{id}/retract body. */
export const retractSchema = z.object({
  reason: z.string().trim().min(5, "Say why the entry is retracted (at least 5 characters)").max(1000),
});

const tagsText = z.string().superRefine((v, ctx) => void parsed(normaliseTags)(v, ctx));
const runsText = z.string().superRefine((v, ctx) => void parsed(parseRunNumbers)(v, ctx));

/** What the editor form holds (tags and runs as typed text). */
export const entryFormSchema = z.object({
  category,
  title,
  body,
  tags: tagsText,
  runNumbers: runsText,
  needsSafetyReview: z.boolean(),
});
export type EntryFormValues = z.infer<typeof entryFormSchema>;

export { firstIssue } from "@/lib/validation/zod-issue";
