"use client";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { authClient } from "@/lib/auth/client";

export function ForgotForm() {
  const [state, setState] = useState<"idle" | "pending" | "sent">("idle");
  const [error, setError] = useState<string | null>(null);
  const [fieldError, setFieldError] = useState<string | undefined>();

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const email = String(new FormData(event.currentTarget).get("email") ?? "").trim();
    if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email)) {
      setFieldError("Enter your e-mail address.");
      return;
    }
    setFieldError(undefined);
    setError(null);
    setState("pending");
    const { error: err } = await authClient.requestPasswordReset({ email, redirectTo: "/set-password" }).catch(() => ({ error: { status: 0 } }));
    if (err && err.status === 429) {
      setError("Too many requests from here. Wait a minute, then try again.");
      setState("idle");
      return;
    }
    // The same answer whether or not the address has an account.
    setState("sent");
  }

  if (state === "sent") {
    return <Notice tone="good">If that address has a Roostline account, a message with a reset link is on its way.</Notice>;
  }
  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Reset password">
      {error && <Notice tone="bad">{error}</Notice>}
      <TextField label="E-mail" name="email" type="email" autoComplete="username" error={fieldError} required />
      <Button type="submit" className="w-full" disabled={state === "pending"}>
        {state === "pending" ? "Sending…" : "Send a reset link"}
      </Button>
    </form>
  );
}
