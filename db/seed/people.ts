/** The invented crew of the Kestrin Deep Site: one demo user per role and one who holds several. */
import type { Role } from "../schema/auth";

export type DemoPerson = { email: string; displayName: string; password: string; roles: Role[] };

export const DEMO_PEOPLE: DemoPerson[] = [
  { email: "mara.velen@kestrin-deep.example", displayName: "Mara Velen", password: "quillon-crew-1", roles: ["shift_crew"] },
  { email: "tobias.renn@kestrin-deep.example", displayName: "Tobias Renn", password: "quillon-expert-1", roles: ["detector_expert"] },
  { email: "ilse.achter@kestrin-deep.example", displayName: "Ilse Achter", password: "quillon-expert-2", roles: ["detector_expert"] },
  { email: "priya.castel@kestrin-deep.example", displayName: "Priya Castel", password: "quillon-convener", roles: ["analysis_convener"] },
  { email: "oskar.lunde@kestrin-deep.example", displayName: "Oskar Lunde", password: "quillon-safety-1", roles: ["safety_officer"] },
  { email: "hedda.marsh@kestrin-deep.example", displayName: "Hedda Marsh", password: "quillon-admin-1", roles: ["admin"] },
  {
    email: "jonah.fell@kestrin-deep.example",
    displayName: "Jonah Fell",
    password: "quillon-multi-1",
    roles: ["shift_crew", "detector_expert", "safety_officer"],
  },
];
