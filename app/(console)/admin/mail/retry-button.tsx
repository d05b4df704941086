"use client";
import { useActionState } from "react";
import { SubmitButton } from "@/components/ui/submit-button";
import type { ActionResult } from "@/lib/http/action";
import { retryMailAction } from "./actions";

export function RetryButton({ mailId }: { mailId: number }) {
  const [state, action] = useActionState<ActionResult, FormData>(retryMailAction, { ok: true });
  return (
    <form action={action}>
      <input type="hidden" name="mailId" value={mailId} />
      <SubmitButton variant="secondary" size="sm" pendingText="Sending…">
        Send again
      </SubmitButton>
      {(!state.ok || state.message) && <p className="mt-1 text-xs" role="status">{state.message}</p>}
    </form>
  );
}
