/** The access decision itself, free of Next and the database so that it can be unit-tested. */
import type { Role } from "@/db/schema/auth";
import { rolesAllow, scopesAllow, type Action } from "./permissions";

export type Principal =
  | { kind: "user"; id: number; email: string; name: string; roles: Role[] }
  | { kind: "token"; id: number; name: string; scopes: string[] };

export type Decision = "allowed" | "unauthenticated" | "forbidden";

/** Whether a principal (or nobody) may perform an action, per the permission table. */
export function decide(principal: Principal | null, action: Action): Decision {
  if (!principal) return "unauthenticated";
  const ok = principal.kind === "user" ? rolesAllow(principal.roles, action) : scopesAllow(principal.scopes, action);
  return ok ? "allowed" : "forbidden";
}
