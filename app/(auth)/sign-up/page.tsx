import type { Metadata } from "next";
import { SignUpForm } from "@/components/auth/auth-forms";
import { signUpAction } from "../actions";

export const metadata: Metadata = { title: "Set up your company" };

export default function SignUpPage() {
  return (
    <>
      <h1 className="text-3xl font-bold">Set up your company</h1>
      <p className="text-lg">You become its owner and can invite your planners and yard hands.</p>
      <SignUpForm action={signUpAction} />
    </>
  );
}
