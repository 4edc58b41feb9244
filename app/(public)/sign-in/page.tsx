import { SessionProvider } from "@/components/shell/SessionProvider";
import { SignInForm } from "./SignInForm";

export const metadata = { title: "Sign in" };

function safeNext(next: string | undefined): string {
  // Only same-site paths, so the sign-in page cannot be used to bounce people elsewhere.
  return next && next.startsWith("/") && !next.startsWith("//") ? next : "/";
}

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string; welcome?: string }> }) {
  const params = await searchParams;
  return (
    <main className="grid min-h-screen place-items-center p-6">
      <div className="w-full max-w-sm rounded-lg border border-line bg-panel p-6 shadow-lg">
        <h1 className="text-2xl font-semibold tracking-tight">Deepshift</h1>
        <p className="mb-6 text-sm text-muted">Kestrin Deep Site · run record and data quality</p>
        {params.welcome && (
          <p className="mb-4 rounded border border-good/60 bg-good/10 px-3 py-2 text-sm">✓ Password set. Sign in with it now.</p>
        )}
        <SessionProvider>
          <SignInForm next={safeNext(params.next)} />
        </SessionProvider>
      </div>
    </main>
  );
}
