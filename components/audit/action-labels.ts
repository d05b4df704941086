/** Audit actions in our own words; an action missing here is shown by its code. */
export const ACTION_LABELS: Record<string, string> = {
  "user.invited": "Invited a person",
  "user.invitation_resent": "Re-sent an invitation",
  "user.role_changed": "Changed a role",
  "user.deactivated": "Deactivated a person",
  "user.reactivated": "Reactivated a person",
  "profile.created": "Created a profile",
  "revision.saved": "Saved a revision",
  "revision.submitted": "Submitted for review",
  "revision.approved": "Approved",
  "revision.changes_requested": "Sent back",
  "revision.withdrawn": "Withdrew from review",
  "revision.commented": "Commented",
  "settings.safety_approvals": "Changed approvals needed",
};

/** An action's label, falling back to its code. */
export function actionLabel(action: string): string {
  return ACTION_LABELS[action] ?? action;
}
