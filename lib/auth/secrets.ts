/** Password hashing and one-time tokens (invitations, machine tokens). */
import { createHash, randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";

const BCRYPT_COST = 11;

/** bcrypt hash of a password. */
export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

/** True when the password matches the stored bcrypt hash. */
export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

/** A fresh random token (URL-safe) and the SHA-256 hash that is stored in its place. */
export function newToken(prefix = ""): { token: string; hash: string } {
  const token = prefix + randomBytes(24).toString("base64url");
  return { token, hash: hashToken(token) };
}

/** SHA-256 hex of a token; only this is kept in the database. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
