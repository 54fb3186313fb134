import { GROUND_FOUND_LABELS } from "@/app/_lib/review/ground-labels";
import { dateTimeInWords } from "@/components/ui/dates";
import { formatQuantity, type UnitSystem } from "@/components/format/quantity";
import type { AsBuiltEntry } from "@/db/queries/as-built";
import type { HoldRecord } from "@/db/queries/holds";

/** What the crew recorded, hole by hole, with what differs from the spec said in words. */
export function AsBuiltLog({ entries, holds = [], timeZone, depthIn, diameterIn, units = "imperial" }: { entries: AsBuiltEntry[]; holds?: HoldRecord[]; timeZone?: string; depthIn: number; diameterIn: number; units?: UnitSystem }) {
  const len = (inches: number) => formatQuantity(inches, "in", units, { decimals: 2 });
  if (entries.length === 0) return <p className="mt-3 text-sm text-slate-600">No hole recorded yet.</p>;
  return (
    <ul className="mt-4 space-y-3">
      {entries.map((e) => {
        const problems = [
          e.measuredDepthIn < depthIn ? `shallower than ${len(depthIn)}` : null,
          e.measuredDiameterIn < diameterIn ? `narrower than ${len(diameterIn)}` : null,
          e.groundFound !== "as_expected" ? GROUND_FOUND_LABELS[e.groundFound].toLowerCase() : null,
        ].filter(Boolean);
        return (
          <li key={e.id} className={`rounded-md border p-3 text-sm ${problems.length ? "border-red-400 bg-red-50" : "border-slate-200"}`}>
            <p className="font-semibold">Post {e.postId}: {len(e.measuredDiameterIn)} × {len(e.measuredDepthIn)} deep, ground {GROUND_FOUND_LABELS[e.groundFound].toLowerCase()}</p>
            <p>{problems.length ? <strong className="text-red-800">Does not match the spec: {problems.join(", ")}</strong> : "Matches the spec"}</p>
            {e.notes ? <p className="text-slate-700">{e.notes}</p> : null}
            <p className="text-xs text-slate-700">{e.recordedByName}, {dateTimeInWords(e.recordedAt, timeZone)}</p>
            {holds.filter((h) => h.asBuiltEntryId === e.id).map((h) => (
              <p key={h.id} className={`mt-1 rounded p-2 ${h.clearedAt ? "bg-sky-100 text-sky-950" : "bg-red-100 font-semibold text-red-900"}`}>
                {h.clearedAt ? <>Hold cleared by {h.clearedByName}, {dateTimeInWords(h.clearedAt, timeZone)}: <strong>{h.clearNote}</strong></> : "On hold: waiting for the engineer."}
              </p>
            ))}
            {e.photoKeys.length ? (
              <div className="mt-2 flex flex-wrap gap-2">
                {e.photoKeys.map((_, i) => (
                  <a key={i} href={`/api/as-built/${e.id}/photos/${i}`}>
                    {/* eslint-disable-next-line @next/next/no-img-element */}
                    <img src={`/api/as-built/${e.id}/photos/${i}`} alt={`Hole ${e.postId}, photo ${i + 1}`} className="h-20 w-20 rounded object-cover" />
                  </a>
                ))}
              </div>
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}
