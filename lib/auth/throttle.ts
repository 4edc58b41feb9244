/** Sign-in rate limit: at most 5 failures per account and per address in 15 minutes. */
import { clearFailures, failuresSince, recordFailure } from "@/db/throttle";

export const MAX_FAILURES = 5;
export const WINDOW_MS = 15 * 60 * 1000;

/** The throttle keys of one attempt. */
export function throttleKeys(email: string, address: string): { account: string; address: string } {
  return { account: `account:${email.trim().toLowerCase()}`, address: `address:${address}` };
}

/** True when the account or the address has used up its failures in the window. */
export function isBlocked(counts: Map<string, number>, keys: string[]): boolean {
  return keys.some((k) => (counts.get(k) ?? 0) >= MAX_FAILURES);
}

/** Whether an attempt may proceed now. */
export async function attemptAllowed(email: string, address: string, now = new Date()): Promise<boolean> {
  const k = throttleKeys(email, address);
  const counts = await failuresSince([k.account, k.address], new Date(now.getTime() - WINDOW_MS));
  return !isBlocked(counts, [k.account, k.address]);
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
