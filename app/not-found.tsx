import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg px-5 py-16">
      <p className="text-sm font-medium text-slate-500">404 — not found</p>
      <h1 className="mt-2 text-2xl font-semibold">Nothing here</h1>
      <p className="mt-3 text-slate-600">The page does not exist, or it belongs to an organisation you are not a member of.</p>
      <Link href="/" className="mt-6 inline-block text-accent-700 underline">Go to the start page</Link>
    </main>
  );
}
