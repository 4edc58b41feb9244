/** Sends the form's values to the API: POST for a new entry, PUT (with the revision the edit started from) for an edit. */
import { normaliseTags, parseRunNumbers } from "@/lib/logbook/entry-input";
import type { EntryFormValues } from "./entry-schema";

/** The API's answer with its HTTP status (201/200 saved, 400 bad field, 409 stale or retracted). */
export type SaveAnswer = {
  status: number;
  id?: number;
  revision?: number;
  error?: string;
  field?: string;
  code?: string;
  currentRevision?: number;
  warning?: string;
};

/** Save the values; rejects only when the server cannot be reached at all. */
export async function sendEntry(entryId: number | null, values: EntryFormValues, baseRevision: number | null): Promise<SaveAnswer> {
  const payload = {
    category: values.category,
    title: values.title,
    body: values.body,
    tags: normaliseTags(values.tags),
    runNumbers: parseRunNumbers(values.runNumbers),
    needsSafetyReview: values.needsSafetyReview,
    ...(entryId ? { baseRevision } : {}),
  };
  const res = await fetch(entryId ? `/api/entries/${entryId}` : "/api/entries", {
    method: entryId ? "PUT" : "POST",
    headers: { "content-type": "application/json" },
    body: JSON.stringify(payload),
  });
  const answer = (await res.json().catch(() => ({ error: `the server answered ${res.status}` }))) as Omit<SaveAnswer, "status">;
  return { ...answer, status: res.status };
}
