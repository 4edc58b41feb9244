"use client";
import { useActionState, useRef, useState, useTransition } from "react";
import { submitKeepingInput } from "@/components/quality/keep-form";
import { RunTimeline } from "@/components/quality/RunTimeline";
import { formatUtcInput } from "@/components/quality/utc-input";
import { proposeFlagAction, runTimelineAction, type FormState, type TimelineResult } from "./actions";

type Subsystem = { code: string; label: string };

const field = "mt-1 w-full rounded border border-line bg-raised px-2 py-1.5";

/** Propose a flag: pick the interval on a run's timeline or type it, then subsystem, verdict and reason. */
export function ProposeFlagForm({ subsystems }: { subsystems: Subsystem[] }) {
  const [runText, setRunText] = useState("");
  const [timeline, setTimeline] = useState<TimelineResult | null>(null);
  const [startText, setStartText] = useState("");
  const [endText, setEndText] = useState("");
  const [pick, setPick] = useState<{ startMs: number | null; endMs: number | null }>({ startMs: null, endMs: null });
  const formRef = useRef<HTMLFormElement>(null);
  // A refused proposal keeps what was typed; an accepted one clears the form and re-reads the timeline,
  // so the new flag shows on the bar.
  const [state, action, pending] = useActionState<FormState, FormData>(async (prev, form) => {
    const result = await proposeFlagAction(prev, form);
    if (result.done) {
      formRef.current?.reset();
      setStartText("");
      setEndText("");
      setPick({ startMs: null, endMs: null });
      if (timeline && "run" in timeline) setTimeline(await runTimelineAction(timeline.run.number));
    }
    return result;
  }, {});
  const [loading, startLoading] = useTransition();

  const showRun = () =>
    startLoading(async () => {
      setTimeline(await runTimelineAction(Number(runText)));
    });
  const onPick = (startMs: number, endMs: number | null) => {
    setPick({ startMs, endMs });
    setStartText(formatUtcInput(startMs));
    setEndText(endMs === null ? "" : formatUtcInput(endMs));
  };

  const err = (name: string) => (state.field === name ? state.error : undefined);
  return (
    <section aria-labelledby="propose-heading" className="rounded-lg border border-line bg-panel p-4">
      <h2 id="propose-heading" className="font-medium">Propose a bad-time flag</h2>
      <p className="text-sm text-muted">A second detector expert confirms it before it changes any exposure.</p>
      <div className="mt-3 flex flex-wrap items-end gap-2">
        <label className="block">
          <span className="text-xs text-muted">Run number (to pick on its timeline)</span>
          <input
            value={runText}
            onChange={(e) => setRunText(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === "Enter") {
                e.preventDefault();
                showRun();
              }
            }}
            inputMode="numeric"
            className="mt-1 block w-40 rounded border border-line bg-raised px-2 py-1.5 tabular"
          />
        </label>
        <button type="button" onClick={showRun} disabled={loading || runText.trim() === ""} className="rounded border border-line px-3 py-1.5 text-sm disabled:opacity-60">
          {loading ? "Loading run…" : "Show run timeline"}
        </button>
      </div>
      {timeline && "error" in timeline && <p role="alert" className="mt-2 text-sm text-bad">⚠ {timeline.error}</p>}
      {timeline && "run" in timeline && <RunTimeline run={timeline.run} flags={timeline.flags} selection={pick} onPick={onPick} />}

      <form ref={formRef} onSubmit={submitKeepingInput(action)} className="mt-4 grid gap-3 md:grid-cols-2" aria-label="Propose a bad-time flag">
        <label className="block">
          <span className="text-xs text-muted">Start (UTC)</span>
          <input name="startAt" value={startText} onChange={(e) => setStartText(e.target.value)} placeholder="2032-01-05 10:00:00" required aria-invalid={!!err("startAt")} className={`${field} tabular`} />
        </label>
        <label className="block">
          <span className="text-xs text-muted">End (UTC)</span>
          <input name="endAt" value={endText} onChange={(e) => setEndText(e.target.value)} placeholder="2032-01-05 11:00:00" required aria-invalid={!!err("endAt")} className={`${field} tabular`} />
        </label>
        <label className="block">
          <span className="text-xs text-muted">Subsystem</span>
          <select name="subsystem" required defaultValue="" className={field}>
            <option value="" disabled>Choose…</option>
            {subsystems.map((s) => (
              <option key={s.code} value={s.code}>{s.label}</option>
            ))}
          </select>
        </label>
        <fieldset className="block">
          <legend className="text-xs text-muted">Verdict</legend>
          <div className="mt-2 flex gap-4 text-sm">
            <label className="flex items-center gap-1.5">
              <input type="radio" name="verdict" value="exclude" defaultChecked /> ✕ exclude from exposure
            </label>
            <label className="flex items-center gap-1.5">
              <input type="radio" name="verdict" value="caution" /> ! caution only
            </label>
          </div>
        </fieldset>
        <label className="block md:col-span-2">
          <span className="text-xs text-muted">Reason</span>
          <textarea name="reason" required rows={2} className={field} />
        </label>
        <div className="md:col-span-2 flex items-center gap-3">
          <button type="submit" disabled={pending} className="rounded bg-accent px-4 py-1.5 font-medium text-ground disabled:opacity-60">
            {pending ? "Proposing…" : "Propose flag"}
          </button>
          {state.error && <p role="alert" className="text-sm text-bad">⚠ {state.error}</p>}
          {state.done && <p role="status" className="text-sm text-good">✓ {state.done}</p>}
        </div>
      </form>
    </section>
  );
}
