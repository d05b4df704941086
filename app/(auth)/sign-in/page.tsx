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
          <SignInForm key={params.email ?? ""} next={next} defaultEmail={typeof params.email === "string" ? params.email.slice(0, 200) : ""} />
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
          <ul className="divide-y divide-loam-100 text-sm dark:divide-loam-800">
            {demoUsers.map((u) => (
              <li key={u.email} className="flex flex-wrap items-baseline justify-between gap-x-3 py-1.5">
                <span className="w-24 font-medium">{ROLE_LABELS[u.role]}</span>
                <Link href={`/sign-in?email=${encodeURIComponent(u.email)}`} className="font-mono text-xs" title="Fill in this e-mail address">
                  {u.email}
                </Link>
                <span className="font-mono text-xs text-loam-600 dark:text-loam-400">{u.password}</span>
              </li>
            ))}
          </ul>
        </Panel>
      )}
    </div>
  );
}
