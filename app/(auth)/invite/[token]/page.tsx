import type { Metadata } from "next";
import Link from "next/link";
import { AcceptInviteForm } from "@/components/auth/auth-forms";
import { acceptInviteAction } from "../../actions";
import { describeInvite } from "@/lib/auth/accounts";
import { ROLE_LABELS } from "@/lib/auth/roles";

export const metadata: Metadata = { title: "Join your team" };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invite = await describeInvite(token);
  if (!invite || !invite.usable) {
    return (
      <>
        <h1 className="text-3xl font-bold">This invite cannot be used</h1>
        <p className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">
          {!invite
            ? "The link is not valid."
            : invite.acceptedAt
              ? "It has already been used."
              : "It has expired or was withdrawn."}{" "}
          Ask your company&apos;s owner for a new invite.
        </p>
        <Link className="text-lg underline" href="/sign-in">Go to sign in</Link>
      </>
    );
  }
  return (
    <>
      <h1 className="text-3xl font-bold">Join <bdi>{invite.organisationName}</bdi></h1>
      <p className="text-lg">You are invited as {ROLE_LABELS[invite.role as keyof typeof ROLE_LABELS].toLowerCase()}.</p>
      <AcceptInviteForm token={token} email={invite.email} action={acceptInviteAction} />
    </>
  );
}
