import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/auth-forms";
import { signInAction } from "../actions";
import { getPrincipal } from "@/lib/auth/session";
import { safeNextPath } from "@/lib/http/next-path";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  const next = safeNextPath((await searchParams).next) ?? undefined;
  if (await getPrincipal()) redirect(next ?? "/");
  return (
    <>
      <h1 className="text-3xl font-bold">Sign in</h1>
      {next?.startsWith("/t/") && <p className="text-lg">Sign in to open the tag you scanned.</p>}
      <SignInForm next={next} action={signInAction} />
    </>
  );
}
