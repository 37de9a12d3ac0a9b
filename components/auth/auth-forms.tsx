"use client";
import Link from "next/link";
import { useSyncExternalStore } from "react";
import { SubmitButton } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormAlert } from "@/components/ui/form-alert";
import type { FormAction } from "@/lib/forms/state";
import { useFormAction } from "@/components/ui/use-form-action";

export function SignInForm({ next, action: signIn }: { next?: string; action: FormAction }) {
  const { state, formProps } = useFormAction(signIn);
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <FormAlert state={state} />
      {next && <input type="hidden" name="next" value={next} />}
      <Field label="E-mail" name="email" type="email" autoComplete="email" defaultValue={state.values?.email} error={state.fieldErrors?.email} />
      <Field label="Password" name="password" type="password" autoComplete="current-password" error={state.fieldErrors?.password} />
      <SubmitButton pendingLabel="Signing in…">Sign in</SubmitButton>
      <div className="mt-4 flex flex-col gap-3 text-lg">
        <Link className="underline" href="/forgot-password">Forgot your password?</Link>
        <Link className="underline" href="/sign-up">New here? Set up your company</Link>
      </div>
    </form>
  );
}

const noChanges = () => () => {};
const browserTimeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone;

export function SignUpForm({ action: signUp }: { action: FormAction }) {
  const { state, formProps } = useFormAction(signUp);
  // The company's time zone starts as this browser's (it can be changed in Settings); the
  // server renders it empty and the browser fills it in.
  const timeZone = useSyncExternalStore(noChanges, browserTimeZone, () => "");
  if (state.ok) {
    // Sent: the e-mail's link finishes the sign-up. The same answer for any address.
    return (
      <div className="flex flex-col gap-4">
        <FormAlert state={state} />
        <Link className="text-lg underline" href="/sign-in">Go to sign in</Link>
      </div>
    );
  }
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <FormAlert state={state} />
      <input type="hidden" name="timeZone" value={timeZone} readOnly />
      <Field label="Company name" name="organisationName" autoComplete="organization" defaultValue={state.values?.organisationName} error={state.fieldErrors?.organisationName} />
      <Field label="Your name" name="name" autoComplete="name" defaultValue={state.values?.name} error={state.fieldErrors?.name} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" defaultValue={state.values?.email} error={state.fieldErrors?.email} />
      <Field label="Password" name="password" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.fieldErrors?.password} />
      <SubmitButton pendingLabel="Sending…">Set up company</SubmitButton>
      <Link className="mt-4 text-lg underline" href="/sign-in">Already have an account? Sign in</Link>
    </form>
  );
}

export function ForgotPasswordForm({ action: requestReset }: { action: FormAction }) {
  const { state, formProps } = useFormAction(requestReset);
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <FormAlert state={state} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" defaultValue={state.values?.email} error={state.fieldErrors?.email} />
      <SubmitButton pendingLabel="Sending…">Send reset link</SubmitButton>
      <Link className="mt-4 text-lg underline" href="/sign-in">Back to sign in</Link>
    </form>
  );
}

export function ResetPasswordForm({ token, action: resetPassword }: { token: string; action: FormAction }) {
  const { state, formProps } = useFormAction(resetPassword);
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <FormAlert state={state} />
      <input type="hidden" name="token" value={token} />
      <Field label="New password" name="password" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.fieldErrors?.password} />
      <SubmitButton pendingLabel="Saving…">Save password and sign in</SubmitButton>
    </form>
  );
}

export function AcceptInviteForm({ token, email, action: accept }: { token: string; email: string; action: FormAction }) {
  const { state, formProps } = useFormAction(accept);
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <FormAlert state={state} />
      <p className="text-lg">
        Your sign-in e-mail: <strong>{email}</strong>
      </p>
      <input type="hidden" name="token" value={token} />
      <Field label="Your name" name="name" autoComplete="name" defaultValue={state.values?.name} error={state.fieldErrors?.name} />
      <Field label="Choose a password" name="password" type="password" autoComplete="new-password" hint="At least 10 characters." error={state.fieldErrors?.password} />
      <SubmitButton pendingLabel="Joining…">Join and sign in</SubmitButton>
    </form>
  );
}

/** The last step of a sign-up, from the e-mailed link: one button, so a link scanner's visit creates nothing. */
export function ConfirmSignUpForm({ token, action: confirm }: { token: string; action: FormAction }) {
  const { state, formProps } = useFormAction(confirm);
  return (
    <form {...formProps} className="flex flex-col gap-2">
      <FormAlert state={state} />
      <input type="hidden" name="token" value={token} />
      <SubmitButton pendingLabel="Setting up…">Set up company and sign in</SubmitButton>
    </form>
  );
}
