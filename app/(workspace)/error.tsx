"use client";

/** Any workspace page that fails to load lands here; nothing was changed, so trying again is safe. */
export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  return (
    <div role="alert" className="rounded-lg border border-red-300 bg-red-50 p-4">
      <p className="font-semibold">This page could not be loaded. Nothing was changed.</p>
      <button type="button" onClick={reset} className="mt-2 rounded-md border border-slate-300 bg-white px-3 py-1 text-sm">Try again</button>
    </div>
  );
}
