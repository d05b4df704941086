import Link from "next/link";
import { Logo } from "@/components/brand/logo";
import { GuidedTour } from "@/components/shell/guided-tour";
import { NavLinks } from "@/components/shell/nav-links";
import { SessionKeepalive } from "@/components/shell/session-keepalive";
import { KeyboardShortcuts } from "@/components/shell/shortcuts";
import { UserMenu } from "@/components/shell/user-menu";
import { ToastProvider } from "@/components/ui/toast";
import { requirePageUser } from "@/lib/auth/guard";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import { navFor } from "@/lib/nav";
import { signOutAction } from "./actions";

export default async function ConsoleLayout({ children }: { children: React.ReactNode }) {
  const user = await requirePageUser("dashboard:read");
  const items = navFor(user.role).map(({ href, label }) => ({ href, label }));
  return (
    <ToastProvider>
      <div className="min-h-screen md:grid md:grid-cols-[15rem_minmax(0,1fr)]">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-3 focus:py-2">
          Skip to content
        </a>
        <aside className="hidden border-r border-loam-200 bg-white px-3 py-4 md:block dark:border-loam-800 dark:bg-loam-900">
          <Link href="/" className="mb-6 block px-2 no-underline hover:no-underline" aria-label="Roostline overview">
            <Logo />
          </Link>
          <nav aria-label="Main">
            <NavLinks items={items} />
          </nav>
        </aside>
        <div className="flex min-w-0 flex-col">
          <header className="flex items-center justify-between gap-3 border-b border-loam-200 bg-white px-4 py-2 dark:border-loam-800 dark:bg-loam-900">
            <details className="md:hidden">
              <summary data-tour="menu-toggle" className="cursor-pointer list-none rounded-md border border-loam-200 px-3 py-1.5 text-sm font-medium dark:border-loam-800">Menu</summary>
              <nav aria-label="Main" className="absolute left-2 right-2 z-30 mt-2 rounded-lg border border-loam-200 bg-white p-2 shadow-lg dark:border-loam-800 dark:bg-loam-900">
                <NavLinks items={items} />
              </nav>
            </details>
            <Link href="/" className="no-underline md:hidden" aria-label="Roostline overview">
              <Logo />
            </Link>
            <div className="ml-auto" data-tour="account-menu">
              <UserMenu name={user.name} email={user.email} roleLabel={ROLE_LABELS[user.role]} signOut={signOutAction} />
            </div>
          </header>
          <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 md:px-8">
            {children}
          </main>
          <footer className="px-4 py-4 text-xs text-loam-600 md:px-8 dark:text-loam-400">
            Roostline computes and checks parameters; it does not replace on-site testing of every door. Powered doors can trap or injure
            animals and hands: follow local codes and licensed practice for wiring and animal welfare.
          </footer>
        </div>
        <SessionKeepalive />
        <KeyboardShortcuts items={items} />
        <GuidedTour userId={user.id} role={user.role} />
      </div>
    </ToastProvider>
  );
}
