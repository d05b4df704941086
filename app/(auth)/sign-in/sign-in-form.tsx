"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { authClient } from "@/lib/auth/client";

/** Maps better-auth's answer to wording that never says which of e-mail or password was wrong. */
function signInMessage(error: { status?: number; code?: string; message?: string }): string {
  if (error.status === 429) return "Too many sign-in attempts from here. Wait a minute, then try again.";
  if (error.code === "BANNED_USER") return "This account has been deactivated. Ask an admin of your team if you need access again.";
  if (error.status && error.status >= 500) return "Roostline could not check your sign-in just now. Try again in a moment.";
  return "That e-mail address and password do not match an account. Check both and try again.";
}

export function SignInForm({ next, defaultEmail = "" }: { next: string; defaultEmail?: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<{ email?: string; password?: string }>({});
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const email = String(form.get("email") ?? "").trim();
    const password = String(form.get("password") ?? "");
    const fe: typeof fieldErrors = {};
    if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email)) fe.email = "Enter your e-mail address.";
    if (!password) fe.password = "Enter your password.";
    setFieldErrors(fe);
    setError(null);
    if (fe.email || fe.password) return;
    setPending(true);
    try {
      const { error: err } = await authClient.signIn.email({ email, password });
      if (err) {
        setError(signInMessage(err));
        return;
      }
      router.replace(next);
      router.refresh();
    } catch {
      setError("Roostline could not be reached. Check your connection and try again.");
    } finally {
      setPending(false);
    }
  }

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Sign in">
      {error && <Notice tone="bad">{error}</Notice>}
      <TextField label="E-mail" name="email" type="email" autoComplete="username" defaultValue={defaultEmail} required error={fieldErrors.email} />
      <TextField label="Password" name="password" type="password" autoComplete="current-password" required error={fieldErrors.password} />
      <Button type="submit" className="w-full" disabled={pending} aria-busy={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
