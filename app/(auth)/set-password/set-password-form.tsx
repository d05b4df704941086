"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { authClient } from "@/lib/auth/client";

export function SetPasswordForm({ token, minLength }: { token: string; minLength: number }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<{ password?: string; confirm?: string }>({});
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const password = String(form.get("password") ?? "");
    const confirm = String(form.get("confirm") ?? "");
    const fe: typeof fieldErrors = {};
    if (password.length < minLength) fe.password = `Use at least ${minLength} characters.`;
    else if (password.length > 128) fe.password = "Use at most 128 characters.";
    if (confirm !== password) fe.confirm = "The two passwords differ.";
    setFieldErrors(fe);
    setError(null);
    if (fe.password || fe.confirm) return;
    setPending(true);
    try {
      const { error: err } = await authClient.resetPassword({ newPassword: password, token });
      if (err) {
        setError(
          err.code === "INVALID_TOKEN"
            ? "This link has expired or has already been used. Ask an admin for a new invitation, or request a new reset link."
            : "The password could not be set. Try again in a moment.",
        );
        return;
      }
      router.replace("/sign-in?passwordSet=1");
    } catch {
      setError("Roostline could not be reached. Check your connection and try again.");
    } finally {
      setPending(false);
    }
  }

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Set password">
      {error && <Notice tone="bad">{error}</Notice>}
      <TextField label="New password" name="password" type="password" autoComplete="new-password" hint={`At least ${minLength} characters. A short sentence is easy to remember.`} error={fieldErrors.password} required />
      <TextField label="Repeat the password" name="confirm" type="password" autoComplete="new-password" error={fieldErrors.confirm} required />
      <Button type="submit" className="w-full" disabled={pending} aria-busy={pending}>
        {pending ? "Saving…" : "Set password"}
      </Button>
    </form>
  );
}
