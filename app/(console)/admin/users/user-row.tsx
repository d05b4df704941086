"use client";
import { useActionState, useEffect, useRef, type ComponentProps } from "react";
import { useFormStatus } from "react-dom";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { Badge, Td } from "@/components/ui/surface";
import { SubmitButton } from "@/components/ui/submit-button";
import { useToast } from "@/components/ui/toast";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/auth/permissions";
import type { ActionResult } from "@/lib/http/action";
import { changeRoleAction, deactivateUserAction, reactivateUserAction, resendInvitationAction } from "./actions";

type Props = { id: string; name: string; email: string; role: Role; status: "invited" | "active" | "deactivated"; isSelf: boolean };

const STATUS_TONE = { invited: "warn", active: "good", deactivated: "neutral" } as const;
const STATUS_LABEL = { invited: "Invited", active: "Active", deactivated: "Deactivated" } as const;

function Result({ state }: { state: ActionResult }) {
  if (state.ok && !state.message) return null;
  return (
    <p role={state.ok ? "status" : "alert"} className={`mt-1 text-xs ${state.ok ? "text-meadow-700 dark:text-meadow-100" : "text-ember-700 dark:text-ember-100"}`}>
      {state.ok ? state.message : (state.fieldErrors?.role ?? state.message)}
    </p>
  );
}

/** Toasts each successful result once; the inline line under the control stays as it was. */
function useToastOnSuccess(state: ActionResult, title: string) {
  const { notify } = useToast();
  const shown = useRef(state);
  useEffect(() => {
    // Each action run returns a new object; the page's refresh after it must not toast it again.
    if (shown.current === state) return;
    shown.current = state;
    if (state.ok && state.message) notify({ tone: "success", title, description: state.message });
  }, [state, title, notify]);
}

// Opens the confirmation instead of submitting; shows the form's progress like SubmitButton does.
function DeactivateButton(props: ComponentProps<typeof Button>) {
  const { pending } = useFormStatus();
  return (
    <Button variant="danger" size="sm" {...props} disabled={pending || props.disabled} aria-busy={pending}>
      {pending ? "Saving…" : "Deactivate"}
    </Button>
  );
}

export function UserRow(user: Props) {
  const [roleState, roleAction] = useActionState<ActionResult, FormData>(changeRoleAction, { ok: true });
  const [activeState, activeAction] = useActionState<ActionResult, FormData>(
    user.status === "deactivated" ? reactivateUserAction : deactivateUserAction,
    { ok: true },
  );
  const [inviteState, inviteAction] = useActionState<ActionResult, FormData>(resendInvitationAction, { ok: true });
  const activeForm = useRef<HTMLFormElement>(null);
  useToastOnSuccess(roleState, user.name);
  useToastOnSuccess(activeState, user.name);
  useToastOnSuccess(inviteState, user.name);
  const selectId = `role-${user.id}`;
  return (
    <tr data-user-email={user.email}>
      <Td>
        <span className="font-medium">{user.name}</span>
        {user.isSelf && <span className="ml-1 text-xs text-loam-600 dark:text-loam-400">(you)</span>}
        <span className="block text-xs text-loam-600 dark:text-loam-400">{user.email}</span>
      </Td>
      <Td>
        <Badge tone={STATUS_TONE[user.status]}>{STATUS_LABEL[user.status]}</Badge>
      </Td>
      <Td>
        <form action={roleAction} className="flex items-center gap-2">
          <input type="hidden" name="userId" value={user.id} />
          <label htmlFor={selectId} className="sr-only">
            Role of {user.name}
          </label>
          <select id={selectId} name="role" defaultValue={user.role} className="rounded-md border border-loam-200 bg-white px-2 py-1 text-sm dark:border-loam-800 dark:bg-loam-900">
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
          <SubmitButton variant="secondary" size="sm" pendingText="Saving…">
            Set role
          </SubmitButton>
        </form>
        <Result state={roleState} />
      </Td>
      <Td>
        <div className="flex flex-wrap gap-2">
          {user.status === "invited" && (
            <form action={inviteAction}>
              <input type="hidden" name="userId" value={user.id} />
              <SubmitButton variant="secondary" size="sm" pendingText="Sending…">
                Re-send invitation
              </SubmitButton>
            </form>
          )}
          <form ref={activeForm} action={activeAction}>
            <input type="hidden" name="userId" value={user.id} />
            {user.status === "deactivated" ? (
              <SubmitButton variant="secondary" size="sm" pendingText="Saving…">
                Reactivate
              </SubmitButton>
            ) : (
              <ConfirmDialog
                trigger={<DeactivateButton />}
                title={`Deactivate ${user.name}?`}
                description={`Their sessions end at once and they can no longer sign in. Their revisions, reviews and audit entries stay. You can reactivate ${user.email} later.`}
                confirmLabel="Yes, deactivate"
                destructive
                onConfirm={() => activeForm.current?.requestSubmit()}
              />
            )}
          </form>
        </div>
        <Result state={activeState} />
        <Result state={inviteState} />
      </Td>
    </tr>
  );
}
