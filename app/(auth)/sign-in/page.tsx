import type { Metadata } from "next";
import Link from "next/link";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { Notice, Panel } from "@/components/ui/surface";
import { demoUsers } from "@/db/seed/demo";
import { getSessionUser } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { safeNextPath } from "@/lib/auth/safe-redirect";
import { getEnv } from "@/lib/env";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

type Search = { next?: string; signedOut?: string; passwordSet?: string; email?: string };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Search> }) {
  const params = await searchParams;
  const next = safeNextPath(params.next);
  if (await getSessionUser(await headers())) redirect(next);
  const showDemo = getEnv().ROOSTLINE_DEMO;
  return (
    <div className="space-y-4">
      <Panel>
        <h1 className="mb-1 text-xl font-semibold">Sign in to Roostline</h1>
        <p className="mb-4 text-sm text-loam-600 dark:text-loam-400">Accounts are by invitation from an admin of your team.</p>
        <div className="space-y-3">
          {params.signedOut && <Notice tone="good">You are signed out.</Notice>}
          {params.passwordSet && <Notice tone="good">Your password is set. Sign in with it now.</Notice>}
          <SignInForm next={next} defaultEmail={typeof params.email === "string" ? params.email.slice(0, 200) : ""} />
        </div>
        <p className="mt-4 text-sm">
          <Link href="/forgot-password">Forgot your password?</Link>
        </p>
      </Panel>
      {showDemo && (
        <Panel>
          <h2 className="mb-2 text-base font-semibold">Demo accounts</h2>
          <p className="mb-3 text-sm text-loam-600 dark:text-loam-400">
            The demo data belongs to Hollowmere Door Works, an invented controller maker. Each role sees a different menu.
          </p>
          <div className="overflow-x-auto">
          <table className="w-full text-sm">
            <thead>
              <tr className="text-left text-xs uppercase text-loam-600 dark:text-loam-400">
                <th className="py-1 font-semibold">Role</th>
                <th className="py-1 font-semibold">E-mail</th>
                <th className="py-1 font-semibold">Password</th>
              </tr>
            </thead>
            <tbody>
              {demoUsers.map((u) => (
                <tr key={u.email} className="border-t border-loam-100 dark:border-loam-800">
                  <td className="py-1 pr-2">{ROLE_LABELS[u.role]}</td>
                  <td className="py-1 pr-2 font-mono text-xs">{u.email}</td>
                  <td className="py-1 font-mono text-xs">{u.password}</td>
                </tr>
              ))}
            </tbody>
          </table>
          </div>
        </Panel>
      )}
    </div>
  );
}
