import Link from "next/link";

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-lg px-5 py-16">
      <p className="text-sm font-medium text-slate-500">403 — not allowed</p>
      <h1 className="mt-2 text-2xl font-semibold">Your role does not allow this page</h1>
      <p className="mt-3 text-slate-600">
        You are signed in, but this needs a role you do not hold in this organisation. Ask an admin of your organisation
        to add the role if you need it.
      </p>
      <Link href="/projects" className="mt-6 inline-block text-accent-700 underline">Back to projects</Link>
    </main>
  );
}
