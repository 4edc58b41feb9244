/** How every API answer and form names a validation failure: the first zod issue as `{ error, field, reason }`. */
import type { z } from "zod";

export type FieldIssue = { error: string; field: string; reason: string };

/** The first problem of a failed parse, with its dotted field path ("body" when the whole input is wrong). */
export function firstIssue(error: z.ZodError): FieldIssue {
  const issue = error.issues[0];
  const field = issue && issue.path.length > 0 ? issue.path.map(String).join(".") : "body";
  const reason = issue?.message ?? "the request is not valid";
  return { error: `${field}: ${reason}`, field, reason };
}
