import { requirePage } from "@/lib/auth/session";

/** Pages made for paper: no app shell, only the page itself. */
export default async function PrintLayout({ children }: { children: React.ReactNode }) {
  await requirePage();
  return children;
}
