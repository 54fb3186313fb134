"use client";

import { useState } from "react";
import { fromDisplay, unitLabel, type UnitSystem } from "@/components/format/quantity";
import { rangeMessageIn, sayIn } from "@/components/format/quantity-text";
import { levelingCuts, type LevelingCuts } from "@/engine/field/leveling-cuts";

/**
 * Laser cut list: the crew reads the distance from each post's top down to the laser line and
 * gets the cut (or gravel) for each post, relative to the reference post (engine `levelingCuts`).
 */
export function LaserCuts({ postIds, units = "imperial" }: { postIds: string[]; units?: UnitSystem }) {
  const [readings, setReadings] = useState<string[]>(postIds.map(() => ""));
  const [reference, setReference] = useState(0);
  let out: LevelingCuts | null = null;
  let error: { index: number | null; message: string } | null = null;
  const filled = readings.every((r) => r.trim() !== "");
  if (filled) {
    try {
      // Readings are typed in the reader's units (mm in metric); the engine works in inches.
      const values = readings.map((r) => fromDisplay(Number(r), "in", units));
      out = levelingCuts({ referenceReadingIn: values[reference], readingsIn: values });
    } catch (e) {
      const field = (e as { field?: string }).field ?? "";
      const index = field.startsWith("readingsIn.") ? Number(field.split(".")[1]) : field === "referenceReadingIn" ? reference : null;
      error = { index, message: (rangeMessageIn((e as Error).message, "in", units) ?? "").replace(/Reading for post (\d+)/, (_, n) => `Reading for post ${postIds[Number(n) - 1] ?? n}`).replace("Reference post reading", `Reading for post ${postIds[reference]}`) };
    }
  }
  return (
    <section aria-labelledby="laser-h" className="no-print rounded-lg border border-slate-200 bg-white p-4">
      <h2 id="laser-h" className="text-lg font-semibold">Laser cut list</h2>
      <p className="text-sm text-slate-600">Stand each post in its hole. Read from the top of each post down to the laser line, in {units === "metric" ? "millimetres" : "inches"}. The cut comes off the bottom of the post.</p>
      <label className="mt-3 block text-sm font-medium" htmlFor="laser-reference">Reference post (the one that stays as it is)</label>
      <select id="laser-reference" value={reference} onChange={(e) => setReference(Number(e.target.value))} className="mt-1 block w-full rounded-md border border-slate-300 bg-white px-3 py-3 text-base">
        {postIds.map((id, i) => <option key={id} value={i}>Post {id}</option>)}
      </select>
      <ul className="mt-3 space-y-2">
        {postIds.map((id, i) => {
          const post = out?.posts[i];
          const bad = error?.index === i;
          return (
            <li key={id} className="grid grid-cols-[5rem_1fr] items-center gap-x-3 gap-y-1">
              <label htmlFor={`reading-${id}`} className="text-base font-semibold">Post {id}</label>
              <div className="flex items-center gap-2">
                <input id={`reading-${id}`} inputMode="decimal" value={readings[i]} onChange={(e) => setReadings(readings.map((r, j) => (j === i ? e.target.value : r)))}
                  aria-invalid={bad ? true : undefined} aria-describedby={`cut-${id}`} placeholder="reading"
                  className="w-28 rounded-md border border-slate-300 px-3 py-3 text-base tabular-nums aria-[invalid]:border-red-600" />
                <span className="text-sm text-slate-600">{unitLabel("in", units)}</span>
              </div>
              <p id={`cut-${id}`} aria-live="polite" className={`col-start-2 text-base ${bad ? "text-red-700" : "font-semibold"}`}>
                {bad ? error!.message : post ? (i === reference ? "Reference: no cut" : sayIn(post.instructionText, units)) : ""}
              </p>
            </li>
          );
        })}
      </ul>
      {error && error.index === null ? <p className="mt-2 text-sm text-red-700">{error.message}</p> : null}
      {!filled ? <p className="mt-2 text-sm text-slate-600">Enter a reading for every post to see the cuts.</p> : null}
    </section>
  );
}
