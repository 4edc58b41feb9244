/** The keyset cursor of the runs list: the (start, id) of the last row seen, as opaque URL-safe text. */
import { RunInputError } from "./errors";
import type { RunCursor } from "./types";

/** Encode a cursor as base64url("<startMs>.<id>"). */
export function encodeCursor(c: RunCursor): string {
  return Buffer.from(`${c.startMs}.${c.id}`, "utf8").toString("base64url");
}

/** Decode a cursor made by encodeCursor; throws RunInputError("cursor") on anything else. */
export function decodeCursor(text: string): RunCursor {
  const m = /^(\d{1,15})\.(\d{1,10})$/.exec(Buffer.from(text, "base64url").toString("utf8"));
  if (!m) throw new RunInputError("cursor", "is not a cursor this list handed out");
  return { startMs: Number(m[1]), id: Number(m[2]) };
}
