import type { Metadata } from "next";
import Link from "next/link";
import { currentUser } from "@/app/_lib/auth";
import { canAccept } from "@/app/_lib/services/engagements";
import { hashToken } from "@/app/_lib/tokens";
import { AnswerForm } from "@/components/engagements/answer-form";
import { answerEngagementAction } from "@/app/(workspace)/queue/actions";
import { findEngagementByToken } from "@/db/queries/engagements";
import { findUserByEmail } from "@/db/queries/users";
import { EngineerSignUpForm } from "./_components/engineer-signup-form";

export const metadata: Metadata = { title: "Review engagement", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

const CLOSED = { accepted: "was accepted", declined: "was declined", revoked: "was withdrawn by the contractor" } as const;

/**
 * Public: the link e-mailed to an outside engineer. Reading it changes nothing. Signed in as the
 * addressee → accept or decline; signed out with an account → sign in and come back; no account →
 * sign up (as themselves or their firm, with their licence), then accept.
 */
export default async function EngagementPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const engagement = await findEngagementByToken(hashToken(token));
  if (!engagement) {
    return (
      <>
        <h1 className="text-2xl font-semibold">This link cannot be used</h1>
        <p role="alert" className="mt-3 text-slate-700">The link is incomplete or not one Pierwise sent. Copy the whole link from the e-mail, or ask the contractor to engage you again.</p>
        <p className="mt-6 text-sm"><Link href="/login" className="text-accent-700 underline">Go to sign in</Link></p>
      </>
    );
  }
  const path = `/engagements/${token}`;
  const user = await currentUser();
  const heading = (
    <>
      <h1 className="text-2xl font-semibold">Review {engagement.projectName} for {engagement.organisationName}</h1>
      <p className="mt-1 text-sm text-slate-600">{engagement.invitedByName} asks you to be the reviewing engineer for this project ({engagement.projectState}).</p>
      {engagement.message ? <blockquote className="mt-3 border-l-4 border-slate-300 pl-3 text-sm whitespace-pre-line text-slate-700">{engagement.message}</blockquote> : null}
    </>
  );
  if (engagement.status !== "invited") {
    const ok = engagement.status === "accepted" && user && engagement.engineerUserId === user.userId;
    return (
      <>
        {heading}
        <p role="status" className="mt-4 text-slate-700">This engagement {CLOSED[engagement.status]}.</p>
        {ok ? <p className="mt-4 text-sm"><Link href="/queue" className="text-accent-700 underline">Open your review queue</Link></p> : null}
      </>
    );
  }
  if (user && user.email.toLowerCase() === engagement.email) {
    const standing = await canAccept(user);
    return (
      <>
        {heading}
        <div className="mt-6 space-y-3 rounded-lg border border-slate-200 bg-white p-5">
          <p className="text-sm">Accepting lets you read this project only (designs, revisions, uploads, reports) and review what {engagement.organisationName} submits to you. They can end it at any time.</p>
          {standing.ok ? null : <p role="alert" className="text-sm text-amber-900">{standing.message} <Link href="/account" className="underline">Open your account</Link>.</p>}
          <AnswerForm engagementId={engagement.id} returnTo={path} project={engagement.projectName} answerAction={answerEngagementAction} />
        </div>
      </>
    );
  }
  if (user) {
    return (
      <>
        {heading}
        <p role="alert" className="mt-4 text-slate-700">You are signed in as {user.email}, but this engagement was sent to {engagement.email}. Sign out, then open the link again.</p>
      </>
    );
  }
  const existing = await findUserByEmail(engagement.email);
  return (
    <>
      {heading}
      <div className="mt-6 rounded-lg border border-slate-200 bg-white p-5">
        {existing ? (
          <p className="text-sm">You have a Pierwise account as {engagement.email}. <Link href={`/login?next=${encodeURIComponent(path)}`} className="font-medium text-accent-700 underline">Sign in to answer</Link>.</p>
        ) : (
          <>
            <p className="mb-4 text-sm">Already use Pierwise under another address? Ask the contractor to engage that one. Otherwise, create your account here; <Link href={`/login?next=${encodeURIComponent(path)}`} className="underline">or sign in</Link>.</p>
            <EngineerSignUpForm token={token} email={engagement.email} />
          </>
        )}
      </div>
    </>
  );
}
