/**
 * The one permission table: which roles (and which machine-token scopes) may do what.
 * Guards and navigation both read it; a new feature adds a row here instead of listing roles in its code.
 */
import type { Role } from "@/db/schema/auth";

export type Permission = {
  roles: readonly Role[];
  /** Machine-token scopes that may also perform the action (DAQ). */
  scopes?: readonly string[];
  /** Plain words for the "not allowed" page. */
  label: string;
};

const EVERYONE: readonly Role[] = ["shift_crew", "detector_expert", "analysis_convener", "safety_officer", "admin"];
const WRITERS: readonly Role[] = ["shift_crew", "detector_expert", "analysis_convener", "safety_officer"];

export const PERMISSIONS = {
  "runs.read": { roles: EVERYONE, scopes: ["daq"], label: "see runs" },
  "runs.write": { roles: ["shift_crew", "detector_expert"], scopes: ["daq"], label: "open and close runs" },
  "configs.manage": { roles: ["detector_expert"], label: "manage detector configurations" },
  "entries.read": { roles: EVERYONE, label: "read the logbook" },
  "entries.write": { roles: WRITERS, label: "write logbook entries" },
  "entries.retract": { roles: ["admin"], label: "retract logbook entries" },
  "flags.read": { roles: EVERYONE, label: "see bad-time flags" },
  "flags.manage": { roles: ["detector_expert"], label: "propose, confirm and withdraw bad-time flags" },
  "periods.read": { roles: EVERYONE, label: "see data-quality periods and exposure" },
  "periods.manage": { roles: ["analysis_convener"], label: "define data-quality periods" },
  "limits.record": { roles: ["analysis_convener"], label: "record observed counts and backgrounds" },
  "safety.review": { roles: ["safety_officer"], label: "work the safety review queue" },
  "sources.read": { roles: EVERYONE, label: "see calibration sources" },
  "sources.manage": { roles: ["safety_officer"], label: "keep the calibration-source inventory" },
  "sources.checkout": { roles: ["safety_officer", "detector_expert"], label: "check calibration sources out and in" },
  "admin.users": { roles: ["admin"], label: "manage people and roles" },
  "admin.tokens": { roles: ["admin"], label: "manage machine tokens" },
  "jobs.run": { roles: ["admin", "safety_officer"], label: "run the scheduled jobs now" },
} as const satisfies Record<string, Permission>;

export type Action = keyof typeof PERMISSIONS;

/** True when any of the given roles may perform the action. */
export function rolesAllow(roles: readonly Role[], action: Action): boolean {
  const allowed: readonly Role[] = PERMISSIONS[action].roles;
  return roles.some((r) => allowed.includes(r));
}

/** True when any of a machine token's scopes may perform the action. */
export function scopesAllow(scopes: readonly string[], action: Action): boolean {
  const allowed: readonly string[] = (PERMISSIONS[action] as Permission).scopes ?? [];
  return scopes.some((s) => allowed.includes(s));
}
