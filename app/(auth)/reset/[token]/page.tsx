import type { Metadata } from "next";
import Link from "next/link";
import { hashToken } from "@/app/_lib/tokens";
import { passwordResetState } from "@/db/queries/password-resets";
import { NewPasswordForm } from "./_components/new-password-form";
import { resetProblem } from "@/app/_lib/account-messages";

export const metadata: Metadata = { title: "Set a new password", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

/** Public: the token in the link is the permission. Reading the page does not use the link up. */
export default async function NewPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const state = await passwordResetState(hashToken(token));
  if (state !== "valid") {
    return (
      <>
        <h1 className="text-2xl font-semibold">This link cannot be used</h1>
        <p role="alert" className="mt-3 text-slate-700">{resetProblem(state)}</p>
        <p className="mt-6 text-sm"><Link href="/reset" className="text-accent-700 underline">Ask for a new link</Link></p>
      </>
    );
  }
  return (
    <>
      <h1 className="text-2xl font-semibold">Set a new password</h1>
      <div className="mt-6 rounded-lg border border-slate-200 bg-white p-5">
        <NewPasswordForm token={token} />
      </div>
    </>
  );
}
