import Link from "next/link";
import { Logo } from "@/components/brand/logo";

export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-screen max-w-lg flex-col items-start justify-center gap-4 px-6">
      <Logo />
      <h1 className="text-2xl font-semibold">This page is not here</h1>
      <p className="text-loam-600 dark:text-loam-400">The address may be mistyped, or what it pointed to has been removed or is not visible to you.</p>
      <Link href="/">Go to the overview</Link>
    </main>
  );
}
