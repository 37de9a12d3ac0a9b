import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/auth/auth-forms";
import { getPrincipal } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage() {
  if (await getPrincipal()) redirect("/");
  return (
    <>
      <h1 className="text-3xl font-bold">Sign in</h1>
      <SignInForm />
    </>
  );
}
