import type { Metadata } from "next";
import { PageHeader, Panel } from "@/components/ui/surface";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/auth";
import { requirePageUser } from "@/lib/auth/guard";
import { ROLE_LABELS, ROLE_SUMMARIES } from "@/lib/auth/permissions";
import { ChangePasswordForm } from "./change-password-form";

export const metadata: Metadata = { title: "Account" };

export default async function AccountPage() {
  const user = await requirePageUser();
  return (
    <>
      <PageHeader title="Your account" />
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel>
          <h2 className="mb-3 text-lg font-semibold">Who you are here</h2>
          <dl className="grid grid-cols-[7rem_1fr] gap-y-2 text-sm">
            <dt className="text-loam-600 dark:text-loam-400">Name</dt>
            <dd>{user.name}</dd>
            <dt className="text-loam-600 dark:text-loam-400">E-mail</dt>
            <dd>{user.email}</dd>
            <dt className="text-loam-600 dark:text-loam-400">Role</dt>
            <dd>
              {ROLE_LABELS[user.role]} — {ROLE_SUMMARIES[user.role]}
            </dd>
          </dl>
          <p className="mt-4 text-sm text-loam-600 dark:text-loam-400">An admin of your team can change your role.</p>
        </Panel>
        <Panel>
          <h2 className="mb-3 text-lg font-semibold">Change password</h2>
          <ChangePasswordForm minLength={MIN_PASSWORD_LENGTH} />
        </Panel>
      </div>
    </>
  );
}
