"use client";
/**
 * Writing and editing an entry: category, title, rich text, tags, linked runs, the safety-review mark and files.
 * The text is kept as a browser draft while typing. A new entry is saved first and its files uploaded after, so a
 * failed upload never loses the entry; an edit names the revision it started from, and a conflict keeps the text.
 */
import { useEffect, useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { MDXEditorMethods } from "@mdxeditor/editor";
import { ENTRY_CATEGORIES } from "@/db/schema/logbook";
import { Caution } from "@/components/ui/Caution";
import { ALLOWED_KINDS_TEXT } from "@/lib/logbook/file-type";
import { formatBytes } from "@/lib/logbook/attachment-check";
import { CATEGORY_LABELS } from "./categories";
import { entryFormSchema, type EntryFormValues } from "./entry-schema";
import { MarkdownEditor } from "./MarkdownEditor";
import { FileUploads, type FileItem } from "./FileUploads";
import { imageMarkdown } from "./upload";
import { useDraft } from "./useDraft";
import { useUploads } from "./useUploads";
import { DraftNotice, ConflictNotice, SavedPanel } from "./FormNotices";
import { sendEntry, type SaveAnswer } from "./save-entry";

export type EntryFormProps = {
  entryId: number | null;
  baseRevision: number | null;
  initial: EntryFormValues;
  maxBytes: number;
  /** A line shown above the form, e.g. that the handover template was loaded. */
  preset?: string;
};

const FIELDS = ["category", "title", "body", "tags", "runNumbers", "needsSafetyReview"] as const;
const input = "mt-1 w-full rounded border border-line bg-raised px-2 py-1.5";

/** The entry editor form for a new entry (entryId null) or a new revision of an existing one. */
export function EntryForm({ entryId, baseRevision: openedRevision, initial, maxBytes, preset }: EntryFormProps) {
  const router = useRouter();
  const editorRef = useRef<MDXEditorMethods>(null);
  const [baseRevision, setBaseRevision] = useState(openedRevision);
  const [conflict, setConflict] = useState<{ currentRevision: number; message: string } | null>(null);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [savedId, setSavedId] = useState<number | null>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const form = useForm<EntryFormValues>({ resolver: zodResolver(entryFormSchema), defaultValues: initial, mode: "onTouched" });
  const { register, handleSubmit, setValue, getValues, reset, setError, watch, formState } = form;
  const errors = formState.errors;
  const draft = useDraft(entryId, initial, openedRevision);
  const uploads = useUploads(maxBytes);
  const restored = draft.restored;

  // A restored draft replaces the form's values (the editor itself starts from the draft's text).
  useEffect(() => {
    if (!restored) return;
    const known = ENTRY_CATEGORIES.find((c) => c === restored.values.category);
    reset({ ...restored.values, category: known ?? initial.category });
    // The draft was written against the revision open at the time; saving it against a newer one must show the conflict.
    if (restored.baseRevision !== null) setBaseRevision(restored.baseRevision);
  }, [restored, reset, initial.category]);
  const category = watch("category");
  const noteChange = () => draft.schedule(getValues());

  const discardDraft = () => {
    draft.discard();
    reset(initial);
    editorRef.current?.setMarkdown(initial.body);
  };

  const uploadImage = entryId
    ? async (file: File) => {
        const outcome = await uploads.addAndUpload(entryId, file);
        if (!outcome.ok) throw new Error(outcome.reason);
        return outcome.attachment.url;
      }
    : undefined;

  async function save(values: EntryFormValues, base: number | null) {
    setSaveError(null);
    setBusy("Saving the entry…");
    let answer: SaveAnswer;
    try {
      answer = await sendEntry(entryId, values, base);
    } catch {
      setBusy(null);
      setSaveError("Could not reach the server; nothing was saved. Your text is kept in this browser — try again when the connection is back.");
      return;
    }
    if (answer.status === 409 && typeof answer.currentRevision === "number") {
      setBusy(null);
      setConflict({ currentRevision: answer.currentRevision, message: answer.error ?? "" });
      return;
    }
    if (answer.status >= 400 || !answer.id) {
      setBusy(null);
      const field = FIELDS.find((f) => f === answer.field);
      if (field) setError(field, { message: answer.error });
      setSaveError(`Not saved: ${answer.error ?? `the server answered ${answer.status}`}. Your text is kept.`);
      return;
    }
    draft.clear();
    setConflict(null);
    setBaseRevision(answer.revision ?? base);
    const id = answer.id;
    if (!entryId) {
      setSavedId(id);
      setBusy(uploads.queued().length ? "Entry saved. Uploading files…" : "Entry saved.");
      const outcomes = await uploads.uploadQueued(id);
      if (outcomes.some((o) => !o.ok)) {
        setBusy(null);
        return; // stay: the rows say which file failed and why, with a retry button each
      }
    }
    router.push(`/logbook/${id}${answer.warning ? `?warning=${encodeURIComponent(answer.warning)}` : ""}`);
    router.refresh();
  }

  const onSubmit = handleSubmit((values) => save(values, baseRevision));

  if (savedId) return <SavedPanel entryId={savedId} uploads={uploads} busy={busy} />;

  return (
    <form onSubmit={onSubmit} onChange={noteChange} noValidate className="space-y-4" aria-label={entryId ? "Edit entry" : "New entry"}>
      {preset && <p className="rounded border border-info/40 bg-info/10 px-3 py-2 text-sm text-info">ℹ {preset}</p>}
      {draft.restored && <DraftNotice savedAt={draft.restored.savedAt} onDiscard={discardDraft} />}
      {conflict && entryId && (
        <ConflictNotice
          entryId={entryId}
          editedRevision={baseRevision ?? 0}
          currentRevision={conflict.currentRevision}
          onSaveOnTop={() => {
            const newest = conflict.currentRevision;
            setBaseRevision(newest);
            void handleSubmit((values) => save(values, newest))();
          }}
        />
      )}
      {(category === "cryogenics" || category === "radiation") && <Caution />}
      <div className="grid gap-3 md:grid-cols-[14rem_1fr]">
        <div>
          <label htmlFor="entry-category" className="text-xs text-muted">Category</label>
          <select id="entry-category" {...register("category")} className={input}>
            {ENTRY_CATEGORIES.map((c) => (
              <option key={c} value={c}>{CATEGORY_LABELS[c]}</option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="entry-title" className="text-xs text-muted">Title</label>
          <input id="entry-title" {...register("title")} aria-invalid={!!errors.title} className={input} autoComplete="off" />
          {errors.title && <p className="text-xs text-bad">⚠ {errors.title.message}</p>}
        </div>
      </div>
      <div>
        <span id="entry-text-label" className="text-xs text-muted">Text</span>
        {draft.checked ? (
          <MarkdownEditor
            labelId="entry-text-label"
            editorRef={editorRef}
            markdown={draft.restored ? draft.restored.values.body : initial.body}
            uploadImage={uploadImage}
            onChange={(md) => {
              setValue("body", md, { shouldDirty: true });
              noteChange();
            }}
          />
        ) : (
          <div className="min-h-[16rem] rounded border border-line bg-panel" />
        )}
        {errors.body && <p className="text-xs text-bad">⚠ {errors.body.message}</p>}
        <p className="mt-1 text-xs text-muted">
          {draft.keptAt ? `Draft kept in this browser at ${draft.keptAt.toISOString().slice(11, 19)} UTC. ` : "Drafts are kept in this browser while you type. "}
          Markdown shortcuts work: ## heading, - list, [ ] checklist, **bold**.
        </p>
      </div>
      <div className="grid gap-3 md:grid-cols-2">
        <div>
          <label htmlFor="entry-tags" className="text-xs text-muted">Tags</label>
          <input id="entry-tags" {...register("tags")} aria-invalid={!!errors.tags} aria-describedby="entry-tags-hint" className={input} autoComplete="off" />
          <p id="entry-tags-hint" className="text-xs text-muted">Separate with commas, e.g. xenon-purity, pmt</p>
          {errors.tags && <p className="text-xs text-bad">⚠ {errors.tags.message}</p>}
        </div>
        <div>
          <label htmlFor="entry-runs" className="text-xs text-muted">Linked runs</label>
          <input id="entry-runs" {...register("runNumbers")} aria-invalid={!!errors.runNumbers} aria-describedby="entry-runs-hint" inputMode="numeric" className={input} autoComplete="off" />
          <p id="entry-runs-hint" className="text-xs text-muted">Run numbers, separated by commas or spaces</p>
          {errors.runNumbers && <p className="text-xs text-bad">⚠ {errors.runNumbers.message}</p>}
        </div>
      </div>
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <input id="entry-safety" type="checkbox" {...register("needsSafetyReview")} aria-describedby="entry-safety-hint" />
        <label htmlFor="entry-safety">Needs safety review</label>
        <span id="entry-safety-hint" className="text-xs text-muted">(cryogenics, radiation and incident entries go to the safety officers in any case)</span>
      </div>
      <fieldset className="rounded border border-line p-3">
        <legend className="px-1 text-xs text-muted">Files</legend>
        <label htmlFor="entry-files" className="text-sm">Attach files</label>
        <input
          id="entry-files"
          type="file"
          multiple
          className="ml-2 text-sm"
          onChange={(e) => {
            const picked = Array.from(e.target.files ?? []);
            e.target.value = "";
            if (entryId) for (const f of picked) void uploads.addAndUpload(entryId, f);
            else uploads.add(picked);
          }}
        />
        <p className="mt-1 text-xs text-muted">
          Accepted: {ALLOWED_KINDS_TEXT}, up to {formatBytes(maxBytes)} each. The type is checked from the file&apos;s contents, not its name.{" "}
          {entryId ? "Files upload straight away; pictures can then be inserted into the text." : "Files upload after the entry is saved."}
        </p>
        <FileUploads
          files={uploads.files}
          onRemove={uploads.remove}
          onRetry={entryId ? (item: FileItem) => void uploads.retry(entryId, item) : undefined}
          onInsert={(item) => item.url && editorRef.current?.insertMarkdown(imageMarkdown(item.file.name, item.url))}
        />
      </fieldset>
      {saveError && <p role="alert" className="text-sm text-bad">⚠ {saveError}</p>}
      <div className="flex items-center gap-3">
        <button type="submit" disabled={!!busy || uploads.busy} className="rounded bg-accent px-4 py-1.5 font-medium text-ground disabled:opacity-60">
          Save entry
        </button>
        {(busy || uploads.busy) && <span role="status" className="text-sm text-muted">{busy ?? "Waiting for uploads to finish…"}</span>}
        {entryId && baseRevision && <span className="text-xs text-muted">Saving makes revision {baseRevision + 1}; earlier revisions stay in the history.</span>}
      </div>
    </form>
  );
}
