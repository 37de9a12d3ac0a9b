import type { Metadata } from "next";
import Link from "next/link";
import { ConfirmSignUpForm } from "@/components/auth/auth-forms";
import { describeSignUp } from "@/lib/auth/accounts";
import { confirmSignUpAction } from "../../../actions";

export const metadata: Metadata = { title: "Finish setting up your company" };

export default async function ConfirmSignUpPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const request = await describeSignUp(token);
  if (!request || request.problem) {
    return (
      <>
        <h1 className="text-3xl font-bold">This link cannot be used</h1>
        <p className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">
          {request?.problem ?? "The link is not valid."}
        </p>
        <Link className="text-lg underline" href="/sign-up">Sign up again</Link>
        <Link className="text-lg underline" href="/sign-in">Go to sign in</Link>
      </>
    );
  }
  return (
    <>
      <h1 className="text-3xl font-bold">Set up {request.organisationName}</h1>
      <p className="text-lg">
        Your sign-in e-mail: <strong>{request.email}</strong>. You become the company&apos;s owner and can invite your planners and yard hands.
      </p>
      <ConfirmSignUpForm token={token} action={confirmSignUpAction} />
    </>
  );
}
