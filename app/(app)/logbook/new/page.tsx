import { ENTRY_CATEGORIES, type EntryCategory } from "@/db/schema/logbook";
import { requireRole } from "@/lib/auth/guards";
import { handoverTemplate, handoverTitle } from "@/lib/logbook/handover";
import { parseMaxBytes } from "@/lib/logbook/attachment-check";
import { parseRunNumbers } from "@/lib/logbook/entry-input";
import { EntryForm } from "@/components/logbook/EntryForm";
import type { EntryFormValues } from "@/components/logbook/entry-schema";

export const metadata = { title: "New entry" };
export const dynamic = "force-dynamic";

type Search = Record<string, string | string[] | undefined>;
const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

function runsFrom(raw: string | undefined): number[] {
  try {
    return raw ? parseRunNumbers(raw) : [];
  } catch {
    return []; // a mistyped link from elsewhere: start without a linked run rather than fail
  }
}

export default async function NewEntryPage({ searchParams }: { searchParams: Promise<Search> }) {
  const user = await requireRole("entries.write");
  const sp = await searchParams;
  const handover = first(sp.template) === "handover";
  const asked = first(sp.category);
  const category: EntryCategory = handover ? "shift_summary" : (ENTRY_CATEGORIES.find((c) => c === asked) ?? "run_note");
  const runs = runsFrom(first(sp.run));
  const now = new Date();
  const initial: EntryFormValues = {
    category,
    title: handover ? handoverTitle(now) : runs.length === 1 ? `Run ${runs[0]}: ` : "",
    body: handover ? handoverTemplate({ at: now, writer: user.name, runNumbers: runs }) : "",
    tags: handover ? "handover" : "",
    runNumbers: runs.join(", "),
    needsSafetyReview: false,
  };
  const preset = handover
    ? "Shift handover template loaded: tick what you checked, fill in the readings, delete what does not apply."
    : runs.length
      ? `Linked to run ${runs.join(", ")}.`
      : undefined;
  return (
    <section className="max-w-5xl">
      <h1 className="mb-3 text-xl font-semibold">{handover ? "Shift handover" : "New entry"}</h1>
      <EntryForm entryId={null} baseRevision={null} initial={initial} maxBytes={parseMaxBytes(process.env.ATTACHMENT_MAX_BYTES)} preset={preset} />
    </section>
  );
}
