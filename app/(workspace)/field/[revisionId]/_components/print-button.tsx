"use client";

export function PrintButton() {
  return (
    <button type="button" onClick={() => window.print()} className="rounded-md bg-accent-700 px-4 py-3 text-base font-medium text-white hover:bg-accent-800">
      Print this spec
    </button>
  );
}
