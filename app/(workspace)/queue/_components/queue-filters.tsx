"use client";

import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useTransition } from "react";

export const QUEUE_STATE_LABELS = { waiting: "Waiting for your review", on_hold: "On hold", decided: "Decided" } as const;

/** Contractor and state filters; each change navigates so the server returns the matching page. */
export function QueueFilters({ contractors, contractor, state }: { contractors: { id: string; name: string }[]; contractor: string; state: string }) {
  const router = useRouter();
  const pathname = usePathname();
  const search = useSearchParams();
  const [pending, start] = useTransition();
  const set = (key: string, value: string) => {
    const next = new URLSearchParams(search.toString());
    if (value) next.set(key, value);
    else next.delete(key);
    next.delete("page");
    start(() => router.replace(`${pathname}?${next.toString()}`, { scroll: false }));
  };
  const select = "mt-1 block w-full rounded-md border border-slate-300 bg-white px-3 py-1.5 text-sm";
  return (
    <div className={`grid gap-3 sm:grid-cols-2 sm:max-w-xl ${pending ? "opacity-70" : ""}`}>
      <div>
        <label htmlFor="queue-contractor" className="block text-xs font-medium text-slate-600">Contractor</label>
        <select id="queue-contractor" value={contractor} onChange={(e) => set("contractor", e.target.value)} className={select}>
          <option value="">Every contractor</option>
          {contractors.map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
        </select>
      </div>
      <div>
        <label htmlFor="queue-state" className="block text-xs font-medium text-slate-600">State</label>
        <select id="queue-state" value={state} onChange={(e) => set("state", e.target.value)} className={select}>
          <option value="">Every state</option>
          {Object.entries(QUEUE_STATE_LABELS).map(([v, label]) => <option key={v} value={v}>{label}</option>)}
        </select>
      </div>
    </div>
  );
}
