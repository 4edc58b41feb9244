"use client";
/**
 * Keeps the form's values in localStorage while the writer types (debounced, and flushed when the page is hidden),
 * so a crash, a closed tab or a lost connection loses nothing. Restores on return; cleared after a successful save.
 */
import { useCallback, useEffect, useRef, useState } from "react";
import { decodeDraft, draftDiffers, draftKey, encodeDraft, type Draft, type DraftValues } from "@/lib/logbook/draft";

const DEBOUNCE_MS = 600;

function storage(): Storage | null {
  try {
    return window.localStorage;
  } catch {
    return null; // private mode or storage disabled: drafts are simply not kept
  }
}

/** Draft handling for one form: what was restored, and functions to schedule, clear or discard. */
export function useDraft(entryId: number | null, initial: DraftValues, baseRevision: number | null) {
  const key = draftKey(entryId);
  const [restored, setRestored] = useState<Draft | null>(null);
  const [checked, setChecked] = useState(false);
  const [keptAt, setKeptAt] = useState<Date | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const latest = useRef<DraftValues | null>(null);
  const stopped = useRef(false);
  const initialRef = useRef(initial);

  const write = useCallback(() => {
    const values = latest.current;
    if (!values || stopped.current) return;
    const store = storage();
    if (!store) return;
    if (!draftDiffers(values, initialRef.current)) {
      store.removeItem(key);
      return;
    }
    try {
      const now = new Date();
      store.setItem(key, encodeDraft(values, baseRevision, now));
      setKeptAt(now);
    } catch {
      // storage full: keep typing, the save button still works
    }
  }, [key, baseRevision]);

  useEffect(() => {
    const draft = decodeDraft(storage()?.getItem(key) ?? null);
    if (draft && draftDiffers(draft.values, initialRef.current)) setRestored(draft);
    setChecked(true);
    const flush = () => {
      if (timer.current) clearTimeout(timer.current);
      write();
    };
    window.addEventListener("pagehide", flush);
    return () => {
      window.removeEventListener("pagehide", flush);
      flush();
    };
  }, [key, write]);

  /** Note new values; they are written after a short pause in typing. */
  const schedule = useCallback(
    (values: DraftValues) => {
      latest.current = values;
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(write, DEBOUNCE_MS);
    },
    [write],
  );

  /** Forget the draft for good (after a successful save). */
  const clear = useCallback(() => {
    stopped.current = true;
    if (timer.current) clearTimeout(timer.current);
    storage()?.removeItem(key);
  }, [key]);

  /** Throw the restored draft away and go back to the saved (or preset) values. */
  const discard = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    latest.current = null;
    storage()?.removeItem(key);
    setRestored(null);
    setKeptAt(null);
  }, [key]);

  return { checked, restored, keptAt, schedule, clear, discard };
}
