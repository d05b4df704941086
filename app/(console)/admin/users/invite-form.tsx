"use client";
import { useActionState } from "react";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { SubmitButton } from "@/components/ui/submit-button";
import { useResetOnSuccess } from "@/components/ui/use-reset-on-success";
import { ROLE_LABELS, ROLE_SUMMARIES, ROLES } from "@/lib/auth/permissions";
import type { ActionResult } from "@/lib/http/action";
import { inviteUserAction } from "./actions";

export function InviteForm() {
  const [state, action] = useActionState<ActionResult, FormData>(inviteUserAction, { ok: true });
  const formRef = useResetOnSuccess(state);
  const fe = state.ok ? {} : (state.fieldErrors ?? {});
  return (
    <form ref={formRef} action={action} noValidate className="space-y-4" aria-label="Invite a colleague">
      {state.ok && state.message && <Notice tone="good">{state.message}</Notice>}
      {!state.ok && <Notice tone="bad">{state.message}</Notice>}
      <TextField label="Name" name="name" autoComplete="off" error={fe.name} required />
      <TextField label="E-mail" name="email" type="email" autoComplete="off" error={fe.email} required />
      <SelectField
        label="Role"
        name="role"
        defaultValue="viewer"
        error={fe.role}
        hint="You can change it later."
        options={ROLES.map((r) => ({ value: r, label: `${ROLE_LABELS[r]} — ${ROLE_SUMMARIES[r]}` }))}
      />
      <SubmitButton pendingText="Sending…">Send invitation</SubmitButton>
    </form>
  );
}
