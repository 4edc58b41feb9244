import { findOpenInvitation } from "@/db/users";
import { hashToken } from "@/lib/auth/secrets";
import { SetPasswordForm } from "./SetPasswordForm";

export const metadata = { title: "Set your password" };
export const dynamic = "force-dynamic";

export default async function SetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  const invitation = token ? await findOpenInvitation(hashToken(token)) : null;
  return (
    <main className="grid min-h-screen place-items-center p-6">
      <div className="w-full max-w-sm rounded-lg border border-line bg-panel p-6">
        <h1 className="mb-1 text-xl font-semibold">Set your Deepshift password</h1>
        {invitation && token ? (
          <>
            <p className="mb-5 text-sm text-muted">
              For {invitation.displayName} ({invitation.email})
            </p>
            <SetPasswordForm token={token} />
          </>
        ) : (
          <p role="alert" className="mt-3 text-sm">
            ⚠ This invitation link has expired or was already used. Ask an admin to send a new one.
          </p>
        )}
      </div>
    </main>
  );
}
