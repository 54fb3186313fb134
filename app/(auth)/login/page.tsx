import type { Metadata } from "next";
import Link from "next/link";
import { safeNext } from "@/app/_lib/safe-next";
import { LoginForm } from "./_components/login-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function LoginPage({ searchParams }: { searchParams: Promise<{ next?: string }> }) {
  const { next } = await searchParams;
  return (
    <>
      <h1 className="text-2xl font-semibold">Sign in to Pierwise</h1>
      <p className="mt-1 text-sm text-slate-600">Designers, reviewing engineers and install crews sign in here.</p>
      <div className="mt-6 rounded-lg border border-slate-200 bg-white p-5">
        <LoginForm next={typeof next === "string" && safeNext(next) === next ? next : undefined} />
      </div>
      <p className="mt-4 text-sm text-slate-600">
        New company? <Link href="/signup" className="text-accent-700 underline">Create an organisation</Link>
      </p>
    </>
  );
}
