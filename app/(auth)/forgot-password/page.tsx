import type { Metadata } from "next";
import { ForgotPasswordForm } from "@/components/auth/auth-forms";
import { requestResetAction } from "../actions";

export const metadata: Metadata = { title: "Forgot password" };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="text-3xl font-bold">Forgot your password?</h1>
      <p className="text-lg">We e-mail you a link to choose a new one.</p>
      <ForgotPasswordForm action={requestResetAction} />
    </>
  );
}
