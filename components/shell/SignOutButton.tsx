"use client";
import { signOut } from "next-auth/react";

/** Ends the session and returns to the sign-in page. */
export function SignOutButton() {
  return (
    <button type="button" onClick={() => signOut({ callbackUrl: "/sign-in" })} className="rounded px-2 py-1 text-xs text-muted hover:text-ink">
      Sign out
    </button>
  );
}
