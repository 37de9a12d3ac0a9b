import { AppShell } from "@/components/shell/app-shell";
import { getOrganisation } from "@/db/organisations";
import { requirePage } from "@/lib/auth/session";
import { signOutAction } from "@/app/(auth)/actions";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const principal = await requirePage();
  const organisation = await getOrganisation(principal.organisationId);
  return (
    <AppShell principal={principal} organisationName={organisation?.name ?? ""} signOut={signOutAction}>
      {children}
    </AppShell>
  );
}
