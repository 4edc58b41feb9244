/** Plain-English names and glyphs of the entry categories (the enum lives in db/schema/logbook.ts). */
import type { EntryCategory } from "@/db/schema/logbook";

export const CATEGORY_LABELS: Record<EntryCategory, string> = {
  shift_summary: "Shift summary",
  run_note: "Run note",
  detector: "Detector",
  cryogenics: "Cryogenics",
  radiation: "Radiation",
  daq_computing: "DAQ and computing",
  calibration: "Calibration",
  maintenance: "Maintenance",
  incident: "Incident",
};

/** A glyph per category so the feed never tells them apart by colour alone. */
export const CATEGORY_GLYPHS: Record<EntryCategory, string> = {
  shift_summary: "⇄",
  run_note: "▶",
  detector: "◎",
  cryogenics: "❄",
  radiation: "☢",
  daq_computing: "⌨",
  calibration: "◈",
  maintenance: "⚒",
  incident: "⚠",
};

/** Categories whose pages carry the cryogenics/radiation caution. */
export const CAUTION_CATEGORIES: readonly EntryCategory[] = ["cryogenics", "radiation"];
