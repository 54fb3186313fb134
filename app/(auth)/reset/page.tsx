import type { Metadata } from "next";
import Link from "next/link";
import { ResetRequestForm } from "./_components/request-form";

export const metadata: Metadata = { title: "Reset password" };

export default function ResetRequestPage() {
  return (
    <>
      <h1 className="text-2xl font-semibold">Forgot your password?</h1>
      <p className="mt-1 text-sm text-slate-600">Enter the e-mail you sign in with. We will send a link to set a new password.</p>
      <div className="mt-6 rounded-lg border border-slate-200 bg-white p-5">
        <ResetRequestForm />
      </div>
      <p className="mt-4 text-sm"><Link href="/login" className="text-accent-700 underline">Back to sign in</Link></p>
    </>
  );
}
