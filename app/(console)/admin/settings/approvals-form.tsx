"use client";
import { useActionState } from "react";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/surface";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ActionResult } from "@/lib/http/action";
import { setApprovalsAction } from "./actions";

export function ApprovalsForm({ current }: { current: number }) {
  const [state, action] = useActionState<ActionResult, FormData>(setApprovalsAction, { ok: true });
  const fe = state.ok ? {} : (state.fieldErrors ?? {});
  return (
    <form action={action} noValidate className="max-w-sm space-y-4" aria-label="Approvals for safety-relevant changes">
      {state.ok && state.message && <Notice tone="good">{state.message}</Notice>}
      {!state.ok && <Notice tone="bad">{state.message}</Notice>}
      <TextField
        label="Approvals for a safety-relevant change"
        name="approvals"
        type="number"
        min={1}
        max={5}
        defaultValue={current}
        error={fe.approvals}
        hint="From different reviewers, never the author. Other changes need one."
      />
      <SubmitButton pendingText="Saving…">Save</SubmitButton>
    </form>
  );
}
