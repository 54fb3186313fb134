import type { Metadata } from "next";
import Link from "next/link";
import { signUpLink } from "@/app/_lib/services/sign-up";
import { ConfirmSignUpForm } from "./_components/confirm-form";

export const metadata: Metadata = { title: "Finish creating your organisation", referrer: "no-referrer" };
export const dynamic = "force-dynamic";

/**
 * Public: the token in the link is the permission. Opening the page does not use the link (mail
 * scanners open links); the button does.
 */
export default async function ConfirmSignUpPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const link = await signUpLink(token);
  if (!link.ok) {
    return (
      <>
        <h1 className="text-2xl font-semibold">This link cannot be used</h1>
        <p role="alert" className="mt-3 text-slate-700">{link.message}</p>
        <p className="mt-6 text-sm">
          <Link href="/login" className="text-accent-700 underline">Sign in</Link> or <Link href="/signup" className="text-accent-700 underline">sign up again</Link>
        </p>
      </>
    );
  }
  return (
    <>
      <h1 className="text-2xl font-semibold">Finish creating {link.organisationName}</h1>
      <p className="mt-1 text-sm text-slate-600">
        {link.name} ({link.email}) becomes the organisation&apos;s admin and signs in with the password chosen on the sign-up form.
      </p>
      <div className="mt-6 rounded-lg border border-slate-200 bg-white p-5">
        <ConfirmSignUpForm token={token} />
      </div>
    </>
  );
}
