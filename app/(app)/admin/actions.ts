"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { createInvitedUser, setActive, setRole, UserExistsError } from "@/db/users";
import { createToken, revokeToken } from "@/db/tokens";
import { ROLES } from "@/db/schema/auth";
import { requireRole } from "@/lib/auth/guards";
import { newToken } from "@/lib/auth/secrets";
import { appUrl, sendMail } from "@/lib/server/mailer";

const INVITATION_HOURS = 48;

const inviteSchema = z.object({
  email: z.email("Enter a valid e-mail address"),
  displayName: z.string().trim().min(2, "Enter the person's name").max(120),
  roles: z.array(z.enum(ROLES)).min(1, "Pick at least one role"),
});

export type InviteState = { error?: string; sentTo?: string };

/** Invite a person: create the account, store the token hash, mail a one-time set-password link. */
export async function inviteAction(_prev: InviteState, form: FormData): Promise<InviteState> {
  const admin = await requireRole("admin.users");
  const parsed = inviteSchema.safeParse({ email: form.get("email"), displayName: form.get("displayName"), roles: form.getAll("roles") });
  if (!parsed.success) return { error: parsed.error.issues[0]?.message ?? "Check the form" };
  const { token, hash } = newToken();
  try {
    await createInvitedUser(
      { userId: admin.id },
      { ...parsed.data, tokenHash: hash, expiresAt: new Date(Date.now() + INVITATION_HOURS * 3600_000) },
    );
  } catch (err) {
    if (err instanceof UserExistsError) return { error: err.message };
    throw err;
  }
  const link = appUrl(`/set-password?token=${token}`);
  await sendMail({
    kind: "invitation",
    to: parsed.data.email,
    subject: "Your Deepshift account at the Kestrin Deep Site",
    text: `Hello ${parsed.data.displayName},\n\n${admin.name} has invited you to Deepshift.\nSet your password here (the link works once, for ${INVITATION_HOURS} hours):\n\n${link}\n`,
  });
  revalidatePath("/admin");
  return { sentTo: parsed.data.email };
}

const roleSchema = z.object({ userId: z.coerce.number().int().positive(), role: z.enum(ROLES), held: z.enum(["true", "false"]) });

/** Grant or remove one role. */
export async function setRoleAction(form: FormData): Promise<void> {
  const admin = await requireRole("admin.users");
  const v = roleSchema.parse(Object.fromEntries(form));
  await setRole({ userId: admin.id }, v.userId, v.role, v.held === "true");
  revalidatePath("/admin");
}

const activeSchema = z.object({ userId: z.coerce.number().int().positive(), active: z.enum(["true", "false"]) });

/** Activate or deactivate an account (an admin cannot deactivate themself). */
export async function setActiveAction(form: FormData): Promise<void> {
  const admin = await requireRole("admin.users");
  const v = activeSchema.parse(Object.fromEntries(form));
  if (v.userId === admin.id && v.active === "false") return;
  await setActive({ userId: admin.id }, v.userId, v.active === "true");
  revalidatePath("/admin");
}

const tokenSchema = z.object({ name: z.string().trim().min(2, "Name the token (e.g. which DAQ host)").max(120) });
export type TokenState = { error?: string; token?: string; name?: string };

/** Create a DAQ machine token; its value is shown once and only its hash is kept. */
export async function createTokenAction(_prev: TokenState, form: FormData): Promise<TokenState> {
  const admin = await requireRole("admin.tokens");
  const parsed = tokenSchema.safeParse({ name: form.get("name") });
  if (!parsed.success) return { error: parsed.error.issues[0]?.message };
  const { token, hash } = newToken("dsk_");
  await createToken({ userId: admin.id }, parsed.data.name, ["daq"], hash);
  revalidatePath("/admin/tokens");
  return { token, name: parsed.data.name };
}

/** Revoke a machine token. */
export async function revokeTokenAction(form: FormData): Promise<void> {
  const admin = await requireRole("admin.tokens");
  const id = z.coerce.number().int().positive().parse(form.get("id"));
  await revokeToken({ userId: admin.id }, id);
  revalidatePath("/admin/tokens");
}
