"use client";

import { useState } from "react";

/** Tick boxes for the crew; printed as empty boxes to tick by hand. */
export function Checklist({ items }: { items: string[] }) {
  const [done, setDone] = useState<boolean[]>(items.map(() => false));
  return (
    <ul className="space-y-2">
      {items.map((item, i) => (
        <li key={item}>
          <label className="flex items-start gap-3 text-base">
            <input type="checkbox" checked={done[i]} onChange={() => setDone(done.map((d, j) => (j === i ? !d : d)))} className="mt-1 h-5 w-5 shrink-0" />
            <span>{item}</span>
          </label>
        </li>
      ))}
    </ul>
  );
}
