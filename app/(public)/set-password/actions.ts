"use server";
import { redirect } from "next/navigation";
import { z } from "zod";
import { acceptInvitation, findOpenInvitation } from "@/db/users";
import { hashPassword, hashToken } from "@/lib/auth/secrets";

const schema = z
  .object({
    token: z.string().min(10),
    password: z.string().min(10, "Use at least 10 characters").max(200),
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { message: "The two passwords differ", path: ["confirm"] });

export type SetPasswordState = { error?: string };

/** Set a password from a one-time invitation link (no session needed: the token is the credential). */
export async function setPasswordAction(_prev: SetPasswordState, form: FormData): Promise<SetPasswordState> {
  const parsed = schema.safeParse(Object.fromEntries(form));
  if (!parsed.success) return { error: parsed.error.issues[0]?.message ?? "Check the form" };
  const invitation = await findOpenInvitation(hashToken(parsed.data.token));
  if (!invitation) return { error: "This link has expired or was already used. Ask an admin for a new invitation." };
  const ok = await acceptInvitation(invitation.invitationId, invitation.userId, await hashPassword(parsed.data.password));
  if (!ok) return { error: "This link was already used." };
  redirect("/sign-in?welcome=1");
}
