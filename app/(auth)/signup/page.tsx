import type { Metadata } from "next";
import Link from "next/link";
import { SignUpForm } from "./_components/signup-form";

export const metadata: Metadata = { title: "Create an organisation" };

export default function SignUpPage() {
  return (
    <>
      <h1 className="text-2xl font-semibold">Create an organisation</h1>
      <p className="mt-1 text-sm text-slate-600">
        One organisation per company. You become its admin and can then invite designers, reviewing engineers and install crews.
      </p>
      <div className="mt-6 rounded-lg border border-slate-200 bg-white p-5">
        <SignUpForm />
      </div>
      <p className="mt-4 text-sm text-slate-600">
        Already have an account? <Link href="/login" className="text-accent-700 underline">Sign in</Link>
      </p>
    </>
  );
}
