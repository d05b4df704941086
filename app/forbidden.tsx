import Link from "next/link";
import { Logo } from "@/components/brand/logo";

export default function Forbidden() {
  return (
    <main className="mx-auto flex min-h-screen max-w-lg flex-col items-start justify-center gap-4 px-6">
      <Logo />
      <h1 className="text-2xl font-semibold">Your role does not open this page</h1>
      <p className="text-loam-600 dark:text-loam-400">If you need it for your work, ask an admin of your team to change your role.</p>
      <Link href="/">Go to the overview</Link>
    </main>
  );
}
