import type { Metadata } from "next";
import Link from "next/link";
import { UnsubscribeForm } from "@/components/mail/unsubscribe-form";
import { REMINDER_LABELS } from "@/lib/mail/kinds";
import { describeUnsubscribe } from "@/lib/mail/service";
import { unsubscribeAction } from "../../actions";

export const metadata: Metadata = { title: "Stop an e-mail" };

/**
 * Where an e-mail's unsubscribe link lands: one button, no sign-in. Opening the page changes
 * nothing (mail scanners open links); the button does.
 */
export default async function UnsubscribePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const link = await describeUnsubscribe(token);
  if (!link) {
    return (
      <>
        <h1 className="text-3xl font-bold">This link cannot be used</h1>
        <p className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">
          The unsubscribe link is not valid. Sign in and open the E-mail page to choose what Linkyard sends you.
        </p>
        <Link className="text-lg underline" href="/sign-in">Go to sign in</Link>
      </>
    );
  }
  const label = REMINDER_LABELS[link.kind];
  return (
    <>
      <h1 className="text-3xl font-bold">{`Stop ${label.short}?`}</h1>
      <p className="text-lg">
        For <strong>{link.email}</strong>: {label.about}
      </p>
      {link.alreadyOff && <p className="rounded-lg border-2 border-ink-soft p-3 text-lg">They are already off for you.</p>}
      <UnsubscribeForm token={token} label={`Stop ${label.short}`} action={unsubscribeAction} />
      <p className="text-base">Your other e-mails stay as they are. To turn this one on again, sign in and open the E-mail page.</p>
      <Link className="text-lg underline" href="/preferences">Choose all your e-mails (sign in)</Link>
    </>
  );
}
