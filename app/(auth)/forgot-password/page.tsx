import type { Metadata } from "next";
import Link from "next/link";
import { Panel } from "@/components/ui/surface";
import { ForgotForm } from "./forgot-form";

export const metadata: Metadata = { title: "Reset password" };

export default function ForgotPasswordPage() {
  return (
    <Panel>
      <h1 className="mb-1 text-xl font-semibold">Reset your password</h1>
      <p className="mb-4 text-sm text-loam-600 dark:text-loam-400">We will e-mail you a link that lets you choose a new one.</p>
      <ForgotForm />
      <p className="mt-4 text-sm">
        <Link href="/sign-in">Back to sign in</Link>
      </p>
    </Panel>
  );
}
