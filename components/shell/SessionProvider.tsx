"use client";
import { SessionProvider as Provider } from "next-auth/react";

/** Client-side session context, for the sign-in and sign-out buttons. */
export function SessionProvider({ children }: { children: React.ReactNode }) {
  return <Provider refetchOnWindowFocus={false}>{children}</Provider>;
}
