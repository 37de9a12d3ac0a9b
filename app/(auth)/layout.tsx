import { Wordmark } from "@/components/ui/logo";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col gap-6 px-4 py-8">
      <Wordmark />
      {children}
      <p className="mt-auto text-sm text-ink-soft">
        Linkyard records gear and applies published securement minimums. It does not replace the
        driver&apos;s own inspection; local rules and licensed practice govern.
      </p>
    </main>
  );
}
