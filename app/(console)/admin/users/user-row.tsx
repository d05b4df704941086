"use client";
import { useActionState } from "react";
import { Badge, Td } from "@/components/ui/surface";
import { SubmitButton } from "@/components/ui/submit-button";
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

export function UserRow(user: Props) {
  const [roleState, roleAction] = useActionState<ActionResult, FormData>(changeRoleAction, { ok: true });
  const [activeState, activeAction] = useActionState<ActionResult, FormData>(
    user.status === "deactivated" ? reactivateUserAction : deactivateUserAction,
    { ok: true },
  );
  const [inviteState, inviteAction] = useActionState<ActionResult, FormData>(resendInvitationAction, { ok: true });
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
          <form
            action={activeAction}
            onSubmit={(e) => {
              if (user.status !== "deactivated" && !window.confirm(`Deactivate ${user.name}? Their sessions end at once and they can no longer sign in.`)) {
                e.preventDefault();
              }
            }}
          >
            <input type="hidden" name="userId" value={user.id} />
            <SubmitButton variant={user.status === "deactivated" ? "secondary" : "danger"} size="sm" pendingText="Saving…">
              {user.status === "deactivated" ? "Reactivate" : "Deactivate"}
            </SubmitButton>
          </form>
        </div>
        <Result state={activeState} />
        <Result state={inviteState} />
      </Td>
    </tr>
  );
}
