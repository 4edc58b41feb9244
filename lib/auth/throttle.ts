/**
 * Sign-in rate limit over a 15-minute window: 5 failures per account, and 30 per client address. The address
 * limit is higher because a control room often shares one address; it still stops one host guessing across accounts.
 */
import { clearFailures, failuresSince, recordFailure } from "@/db/throttle";

export const MAX_ACCOUNT_FAILURES = 5;
export const MAX_ADDRESS_FAILURES = Number(process.env.SIGNIN_ADDRESS_LIMIT ?? 30);
export const WINDOW_MS = 15 * 60 * 1000;

/**
 * The client address for throttling. Forwarded headers are believed only behind a trusted load balancer
 * (TRUST_PROXY=1); otherwise a client could dodge the address limit by sending its own header.
 */
export function clientAddress(headers: Record<string, unknown> | undefined, trustProxy: boolean): string {
  if (!trustProxy) return "direct";
  const fwd = headers?.["x-forwarded-for"];
  const first = typeof fwd === "string" ? fwd.split(",")[0]?.trim() : undefined;
  const real = headers?.["x-real-ip"];
  return first || (typeof real === "string" ? real : "") || "direct";
}

/** The throttle keys of one attempt. */
export function throttleKeys(email: string, address: string): { account: string; address: string } {
  return { account: `account:${email.trim().toLowerCase()}`, address: `address:${address}` };
}

/** True when the account or the address has used up its failures in the window. */
export function isBlocked(counts: Map<string, number>, keys: { account: string; address: string }): boolean {
  return (counts.get(keys.account) ?? 0) >= MAX_ACCOUNT_FAILURES || (counts.get(keys.address) ?? 0) >= MAX_ADDRESS_FAILURES;
}

/** Whether an attempt may proceed now. */
export async function attemptAllowed(email: string, address: string, now = new Date()): Promise<boolean> {
  const k = throttleKeys(email, address);
  const counts = await failuresSince([k.account, k.address], new Date(now.getTime() - WINDOW_MS));
  return !isBlocked(counts, k);
}

/** Count a failed attempt against the account and the address. */
export async function noteFailure(email: string, address: string, now = new Date()): Promise<void> {
  const k = throttleKeys(email, address);
  await recordFailure([k.account, k.address], now, new Date(now.getTime() - WINDOW_MS));
}

/** A successful sign-in clears the account's count (the address keeps its own). */
export async function noteSuccess(email: string, address: string): Promise<void> {
  await clearFailures(throttleKeys(email, address).account);
}

export const THROTTLED_MESSAGE = "Too many failed sign-ins. Wait 15 minutes and try again, or ask an admin.";
export const BAD_CREDENTIALS_MESSAGE = "That e-mail and password do not match an active account.";
