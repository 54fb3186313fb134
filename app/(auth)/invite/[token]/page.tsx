import type { Metadata } from "next";
import Link from "next/link";
import { hashToken } from "@/app/_lib/tokens";
import { findInvitation } from "@/db/queries/invitations";
import { findUserByEmail } from "@/db/queries/users";
import { ROLE_LABELS } from "@/db/roles";
import { AcceptForm } from "./_components/accept-form";
import { invitationProblem } from "@/app/_lib/account-messages";

export const metadata: Metadata = { title: "Accept invitation", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

/** Public: the token in the link is the permission. Reading the page changes nothing. */
export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await findInvitation(hashToken(token));
  const problem = !invitation
    ? invitationProblem("unknown")
    : invitation.acceptedAt
      ? invitationProblem("used")
      : invitation.expiresAt.getTime() <= Date.now()
        ? invitationProblem("expired", invitation.organisationName)
        : null;
  if (!invitation || problem) {
    return (
      <>
        <h1 className="text-2xl font-semibold">This invitation cannot be used</h1>
        <p role="alert" className="mt-3 text-slate-700">{problem}</p>
        <p className="mt-6 text-sm"><Link href="/login" className="text-accent-700 underline">Go to sign in</Link></p>
      </>
    );
  }
  const existing = await findUserByEmail(invitation.email);
  return (
    <>
      <h1 className="text-2xl font-semibold">Join {invitation.organisationName}</h1>
      <p className="mt-1 text-sm text-slate-600">
        {invitation.invitedByName} invited you as {invitation.roles.map((r) => ROLE_LABELS[r]).join(", ")}.
      </p>
      <div className="mt-6 rounded-lg border border-slate-200 bg-white p-5">
        <AcceptForm token={token} email={invitation.email} existingAccount={Boolean(existing)} />
      </div>
    </>
  );
}
