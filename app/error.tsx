"use client";
import { Button } from "@/components/ui/button";

// Shows no error text: details stay in the server log, the digest lets an admin find them.
export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto flex min-h-[60vh] max-w-lg flex-col items-start justify-center gap-4 px-6">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="text-loam-600 dark:text-loam-400">
        Roostline could not show this page. Nothing you saved is lost. Try again; if it keeps happening, give an admin this reference:
        <code className="ml-1 font-mono text-sm">{error.digest ?? "none"}</code>
      </p>
      <Button onClick={reset}>Try again</Button>
    </main>
  );
}
