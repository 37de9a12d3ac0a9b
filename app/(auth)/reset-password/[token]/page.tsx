import type { Metadata } from "next";
import { ResetPasswordForm } from "@/components/auth/auth-forms";
import { resetPasswordAction } from "../../actions";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <>
      <h1 className="text-3xl font-bold">Choose a new password</h1>
      <ResetPasswordForm token={token} action={resetPasswordAction} />
    </>
  );
}
