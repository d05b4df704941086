import type { Metadata } from "next";
import Link from "next/link";
import { Notice, Panel } from "@/components/ui/surface";
import { isSetPasswordTokenUsable } from "@/db/queries/auth-tokens";
import { MIN_PASSWORD_LENGTH } from "@/lib/auth/auth";
import { SetPasswordForm } from "./set-password-form";

export const metadata: Metadata = { title: "Set your password" };

export default async function SetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; welcome?: string; error?: string }> }) {
  const { token, welcome } = await searchParams;
  const wellFormed = typeof token === "string" && /^[A-Za-z0-9_-]{10,100}$/.test(token) ? token : null;
  const usable = wellFormed ? await isSetPasswordTokenUsable({ token: wellFormed }) : false;
  return (
    <Panel>
      <h1 className="mb-1 text-xl font-semibold">{welcome ? "Welcome to Roostline" : "Choose a new password"}</h1>
      <p className="mb-4 text-sm text-loam-600 dark:text-loam-400">
        {welcome ? "Choose the password you will sign in with. The link in your invitation works once." : "The link in your e-mail works once."}
      </p>
      {wellFormed && usable ? (
        <SetPasswordForm token={wellFormed} minLength={MIN_PASSWORD_LENGTH} />
      ) : wellFormed ? (
        <Notice tone="bad" title="This link has expired or has already been used">
          Ask an admin of your team for a new invitation, or <Link href="/forgot-password">request a new reset link</Link>.
        </Notice>
      ) : (
        <Notice tone="bad" title="This link is not complete">
          Open the link from your e-mail again, or <Link href="/forgot-password">ask for a new one</Link>.
        </Notice>
      )}
    </Panel>
  );
}
