/**
 * Server-side guards used by every page, server action and route handler.
 * Pages and actions get a redirect (sign-in, or the "not allowed" page); the API gets 401/403 JSON.
 */
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { NextResponse } from "next/server";
import { findActiveToken } from "@/db/tokens";
import { authOptions } from "./options";
import { decide, type Principal } from "./decide";
import { PERMISSIONS, type Action } from "./permissions";
import { hashToken } from "./secrets";

export type SignedInUser = Extract<Principal, { kind: "user" }>;

/** The signed-in user, or null. */
export async function currentUser(): Promise<SignedInUser | null> {
  const session = await getServerSession(authOptions);
  const u = session?.user;
  if (!u || !u.id) return null;
  return { kind: "user", id: u.id, email: u.email, name: u.name, roles: u.roles };
}

/** For pages and actions: the signed-in user, or a redirect to sign-in. */
export async function requireUser(): Promise<SignedInUser> {
  const user = await currentUser();
  if (!user) redirect("/sign-in");
  return user;
}

/** For pages and actions: the user if the permission table allows the action, else the "not allowed" page. */
export async function requireRole(action: Action): Promise<SignedInUser> {
  const user = await requireUser();
  if (decide(user, action) !== "allowed") redirect(`/not-allowed?action=${encodeURIComponent(action)}`);
  return user;
}

async function principalFrom(req: Request): Promise<Principal | null> {
  const auth = req.headers.get("authorization");
  if (auth?.startsWith("Bearer ")) {
    const token = await findActiveToken(hashToken(auth.slice(7).trim()));
    return token ? { kind: "token", id: token.id, name: token.name, scopes: token.scopes } : null;
  }
  return currentUser();
}

/** JSON error body every route handler uses. */
export function apiError(status: number, error: string, extra?: Record<string, unknown>): NextResponse {
  return NextResponse.json({ error, ...extra }, { status });
}

/** For route handlers: the principal (session or bearer token) if allowed, else a 401/403 response. */
export async function guardApi(req: Request, action: Action): Promise<Principal | NextResponse> {
  const principal = await principalFrom(req);
  const decision = decide(principal, action);
  if (decision === "unauthenticated") return apiError(401, "sign in (or send a valid machine token) first");
  if (decision === "forbidden") return apiError(403, `not allowed to ${PERMISSIONS[action].label}`);
  return principal as Principal;
}

/** The audit actor for a principal. */
export function actorOf(p: Principal): { userId?: number; tokenId?: number } {
  return p.kind === "user" ? { userId: p.id } : { tokenId: p.id };
}
