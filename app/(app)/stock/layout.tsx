import { QueryProvider } from "@/components/providers/query-provider";

/** The screens under here fetch through react-query; pages elsewhere never load it. */
export default function QueryLayout({ children }: { children: React.ReactNode }) {
  return <QueryProvider>{children}</QueryProvider>;
}
