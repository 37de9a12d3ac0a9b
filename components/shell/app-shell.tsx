import Link from "next/link";
import { ROLE_LABELS } from "@/lib/auth/roles";
import type { Principal } from "@/lib/auth/session";
import type { FormAction } from "@/lib/forms/state";
import { barFor, navFor } from "@/lib/shell/nav";
import { Logo } from "@/components/ui/logo";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";

export function AppShell({
  principal,
  organisationName,
  signOut,
  children,
}: {
  principal: Principal;
  organisationName: string;
  signOut: FormAction;
  children: React.ReactNode;
}) {
  const entries = navFor(principal);
  return (
    <div className="min-h-dvh md:grid md:grid-cols-[15rem_1fr] print:block">
      <header className="sticky top-0 z-10 flex items-center justify-between gap-3 bg-deck px-4 py-2 text-white md:hidden print:hidden">
        <Link href="/" className="flex min-h-tap items-center gap-2 text-xl font-bold">
          <Logo className="h-8 w-8" />
          Linkyard
        </Link>
        <div className="flex items-center gap-2">
          <span className="text-right text-sm leading-tight">
            <bdi>{principal.name}</bdi>
            <br />
            <span className="text-signal">{ROLE_LABELS[principal.role]}</span>
          </span>
          <SignOutButton action={signOut} />
        </div>
      </header>

      <aside className="hidden bg-deck p-4 text-white md:flex md:flex-col md:gap-6 print:hidden">
        <Link href="/" className="flex min-h-tap items-center gap-2 text-2xl font-bold">
          <Logo />
          Linkyard
        </Link>
        <p className="text-base leading-snug">
          <strong><bdi>{organisationName}</bdi></strong>
          <br />
          <bdi>{principal.name}</bdi> · <span className="text-signal">{ROLE_LABELS[principal.role]}</span>
          {principal.designated && <><br /><span className="text-sm">Designated person</span></>}
        </p>
        <nav aria-label="Main">
          <NavLinks entries={entries} variant="side" />
        </nav>
        <div className="mt-auto">
          <SignOutButton action={signOut} />
        </div>
      </aside>

      <main className="px-4 pb-24 pt-4 md:px-8 md:pb-8">
        {children}
      </main>

      <nav aria-label="Main" className="fixed inset-x-0 bottom-0 z-10 bg-deck md:hidden print:hidden">
        <NavLinks entries={barFor(principal)} variant="bar" />
      </nav>
    </div>
  );
}
