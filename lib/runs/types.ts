/**
 * Shapes of the run bookkeeping that the DAQ API, the server actions and the pages share.
 * Times are UTC milliseconds; decimals that must stay exact (masses) are canonical decimal strings.
 */

/** Kinds of run the detector takes (the same list as the database enum). */
export const RUN_TYPES = ["science", "calibration", "background", "noise", "commissioning"] as const;
export type RunType = (typeof RUN_TYPES)[number];

/** Where a run is in its life (the same list as the database enum). */
export const RUN_STATUSES = ["running", "ended", "aborted"] as const;
export type RunStatus = (typeof RUN_STATUSES)[number];

/** How a run may be closed. */
export const CLOSING_STATUSES = ["ended", "aborted"] as const;
export type ClosingStatus = (typeof CLOSING_STATUSES)[number];

/** Detectors that share the DAQ; a run that names none belongs to the first. */
export const DETECTORS = ["Quillon", "Quillon-Ge"] as const;
export type Detector = (typeof DETECTORS)[number];
export const DEFAULT_DETECTOR: Detector = "Quillon";

/** Free-form run conditions: drift field, temperatures, pressures, source name... */
export type RunConditions = Record<string, string | number>;

/** A validated request to open a run. */
export interface OpenRunInput {
  number: number;
  type: RunType;
  startMs: number;
  detector: Detector;
  conditions: RunConditions;
  /** Canonical decimal string in kg, or null to take the configuration's fiducial mass. */
  targetMassOverrideKg: string | null;
}

/** A validated request to close a run. Live and dead time are kept to the millisecond. */
export interface CloseRunInput {
  endMs: number;
  liveSeconds: number;
  deadSeconds: number;
  triggerCount: number;
  status: ClosingStatus;
}

/** A validated new detector configuration. */
export interface ConfigInput {
  detector: Detector;
  name: string;
  targetMaterial: string;
  /** Canonical decimal string in kg. */
  fiducialMassKg: string;
  effectiveFromMs: number;
  notes: string | null;
}

/** A validated query of the runs list: filters plus a keyset cursor, newest first. */
export interface RunListQuery {
  type: RunType | null;
  status: RunStatus | null;
  /** Runs starting at or after this instant. */
  fromMs: number | null;
  /** Runs starting before this instant. */
  toMs: number | null;
  cursor: RunCursor | null;
  limit: number;
}

/** Position in the newest-first listing: the last row seen, by (start, id). */
export interface RunCursor {
  startMs: number;
  id: number;
}
