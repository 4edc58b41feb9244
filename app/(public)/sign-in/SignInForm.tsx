"use client";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { signIn } from "next-auth/react";

const schema = z.object({
  email: z.email("Enter an e-mail address"),
  password: z.string().min(1, "Enter your password"),
});
type Values = z.infer<typeof schema>;

/** E-mail and password form; shows the server's reason when sign-in is refused. */
export function SignInForm({ next }: { next: string }) {
  const [failure, setFailure] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(schema) });

  const onSubmit = async (values: Values) => {
    setFailure(null);
    const res = await signIn("credentials", { ...values, redirect: false });
    if (!res || res.error) {
      setFailure(res?.error && res.error !== "CredentialsSignin" ? res.error : "Sign-in failed. Try again.");
      return;
    }
    window.location.assign(next);
  };

  return (
    <form onSubmit={handleSubmit(onSubmit)} className="space-y-4" noValidate>
      <label className="block">
        <span className="text-sm text-muted">E-mail</span>
        <input
          {...register("email")}
          type="email"
          autoComplete="username"
          autoFocus
          className="mt-1 w-full rounded border border-line bg-raised px-3 py-2"
        />
        {formState.errors.email && <span className="text-sm text-bad">{formState.errors.email.message}</span>}
      </label>
      <label className="block">
        <span className="text-sm text-muted">Password</span>
        <input
          {...register("password")}
          type="password"
          autoComplete="current-password"
          className="mt-1 w-full rounded border border-line bg-raised px-3 py-2"
        />
        {formState.errors.password && <span className="text-sm text-bad">{formState.errors.password.message}</span>}
      </label>
      {failure && (
        <p role="alert" data-testid="sign-in-error" className="rounded border border-bad/60 bg-bad/10 px-3 py-2 text-sm">
          <span aria-hidden>⚠ </span>
          {failure}
        </p>
      )}
      <button
        type="submit"
        disabled={formState.isSubmitting}
        className="w-full rounded bg-accent px-3 py-2 font-medium text-ground disabled:opacity-60"
      >
        {formState.isSubmitting ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
