import { Wordmark } from "@/components/ui/logo";

/** What a QR tag opens: outside the app shell, for anyone who scans a tag. */
export default function TagLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col gap-5 px-4 py-6">
      <Wordmark />
      {children}
    </main>
  );
}
