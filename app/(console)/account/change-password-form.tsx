"use client";
import { useActionState } from "react";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { SubmitButton } from "@/components/ui/submit-button";
import { useResetOnSuccess } from "@/components/ui/use-reset-on-success";
import type { ActionResult } from "@/lib/http/action";
import { changePasswordAction } from "./actions";

export function ChangePasswordForm({ minLength }: { minLength: number }) {
  const [state, action] = useActionState<ActionResult, FormData>(changePasswordAction, { ok: true });
  const formRef = useResetOnSuccess(state);
  const fe = state.ok ? {} : (state.fieldErrors ?? {});
  return (
    <form ref={formRef} action={action} noValidate className="max-w-md space-y-4" aria-label="Change password">
      {state.ok && state.message && <Notice tone="good">{state.message}</Notice>}
      {!state.ok && <Notice tone="bad">{state.message}</Notice>}
      <TextField label="Current password" name="currentPassword" type="password" autoComplete="current-password" error={fe.currentPassword} required />
      <TextField label="New password" name="newPassword" type="password" autoComplete="new-password" hint={`At least ${minLength} characters.`} error={fe.newPassword} required />
      <TextField label="Repeat the new password" name="confirmPassword" type="password" autoComplete="new-password" error={fe.confirmPassword} required />
      <SubmitButton pendingText="Changing…">Change password</SubmitButton>
    </form>
  );
}
