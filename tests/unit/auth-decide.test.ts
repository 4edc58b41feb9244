import { describe, expect, it } from "vitest";
import { decide, type Principal } from "@/lib/auth/decide";
import { PERMISSIONS, rolesAllow, scopesAllow, type Action } from "@/lib/auth/permissions";
import type { Role } from "@/db/schema/auth";

const user = (roles: Role[]): Principal => ({ kind: "user", id: 1, email: "a@b.example", name: "A", roles });
const token = (scopes: string[]): Principal => ({ kind: "token", id: 9, name: "daq-1", scopes });

// Expected outcomes follow the role table in the product brief (who may do what).
const cases: { label: string; who: Principal | null; action: Action; expected: ReturnType<typeof decide> }[] = [
  { label: "nobody signed in is unauthenticated", who: null, action: "runs.read", expected: "unauthenticated" },
  { label: "shift crew reads runs", who: user(["shift_crew"]), action: "runs.read", expected: "allowed" },
  { label: "shift crew opens runs", who: user(["shift_crew"]), action: "runs.write", expected: "allowed" },
  { label: "shift crew cannot manage users", who: user(["shift_crew"]), action: "admin.users", expected: "forbidden" },
  { label: "shift crew cannot confirm flags", who: user(["shift_crew"]), action: "flags.manage", expected: "forbidden" },
  { label: "detector expert manages flags", who: user(["detector_expert"]), action: "flags.manage", expected: "allowed" },
  { label: "detector expert does what shift crew does", who: user(["detector_expert"]), action: "runs.write", expected: "allowed" },
  { label: "convener defines periods", who: user(["analysis_convener"]), action: "periods.manage", expected: "allowed" },
  { label: "convener cannot open runs", who: user(["analysis_convener"]), action: "runs.write", expected: "forbidden" },
  { label: "safety officer reviews", who: user(["safety_officer"]), action: "safety.review", expected: "allowed" },
  { label: "detector expert checks out sources", who: user(["detector_expert"]), action: "sources.checkout", expected: "allowed" },
  { label: "shift crew cannot check out sources", who: user(["shift_crew"]), action: "sources.checkout", expected: "forbidden" },
  { label: "admin manages users", who: user(["admin"]), action: "admin.users", expected: "allowed" },
  { label: "admin alone may retract entries", who: user(["admin"]), action: "entries.retract", expected: "allowed" },
  { label: "expert may not retract entries", who: user(["detector_expert"]), action: "entries.retract", expected: "forbidden" },
  { label: "several roles: any one suffices", who: user(["shift_crew", "safety_officer"]), action: "safety.review", expected: "allowed" },
  { label: "a user with no roles is forbidden", who: user([]), action: "runs.read", expected: "forbidden" },
  { label: "DAQ token writes runs", who: token(["daq"]), action: "runs.write", expected: "allowed" },
  { label: "DAQ token reads runs (to check one after a lost reply)", who: token(["daq"]), action: "runs.read", expected: "allowed" },
  { label: "DAQ token cannot read the logbook", who: token(["daq"]), action: "entries.read", expected: "forbidden" },
  { label: "token without scopes is forbidden", who: token([]), action: "runs.write", expected: "forbidden" },
];

describe("decide (access decision from the permission table)", () => {
  it.each(cases)("$label", ({ who, action, expected }) => {
    expect(decide(who, action)).toBe(expected);
  });
});

describe("permission table", () => {
  it("every action names at least one role and a label", () => {
    for (const [action, rule] of Object.entries(PERMISSIONS)) {
      expect(rule.roles.length, action).toBeGreaterThan(0);
      expect(rule.label.length, action).toBeGreaterThan(3);
    }
  });
  it("roles and scopes are checked separately", () => {
    expect(rolesAllow(["admin"], "runs.write")).toBe(false);
    expect(scopesAllow(["daq"], "admin.users")).toBe(false);
    expect(scopesAllow(["daq"], "runs.write")).toBe(true);
  });
});
