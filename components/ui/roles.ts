/** Plain-English names of the roles. */
import type { Role } from "@/db/schema/auth";

export const ROLE_LABELS: Record<Role, string> = {
  shift_crew: "shift crew",
  detector_expert: "detector expert",
  analysis_convener: "analysis convener",
  safety_officer: "safety officer",
  admin: "admin",
};
