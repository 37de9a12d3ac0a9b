import { AppShell } from "@/components/shell/app-shell";
import { requirePage } from "@/lib/auth/session";
import { signOutAction } from "@/app/(auth)/actions";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  // The organisation's name comes with the session (one query for both).
  const principal = await requirePage();
  return (
    <AppShell principal={principal} organisationName={principal.organisationName} signOut={signOutAction}>
      {children}
    </AppShell>
  );
}
