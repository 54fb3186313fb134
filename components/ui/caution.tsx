/**
 * The defer-to-code statement. Shown wherever results, print-outs or field specs appear: Pierwise
 * gives preliminary sizing, never the final word.
 */
export const DEFER_TO_CODE =
  "Preliminary sizing only. The local building code, the authority having jurisdiction and a licensed professional engineer govern; do not build from these numbers until a licensed engineer has reviewed and approved them.";

export const FIELD_CAUTIONS = [
  "Call your local utility-locate service (811 in the US) and wait for marks before you dig.",
  "Cover or fence open holes; never stand in an unshored hole deeper than your waist.",
  "Wet concrete burns skin and eyes — wear gloves and eye protection. Bags and posts are heavy: lift with two people or a machine.",
  "Do not lift or fasten modules in high or gusty wind.",
  "Treat module leads as live in daylight; keep connectors capped until the electrician takes over.",
] as const;

export function Caution({ compact = false, className = "" }: { compact?: boolean; className?: string }) {
  return (
    <aside
      role="note"
      aria-label="Preliminary sizing caution"
      className={`rounded-md border border-amber-300 bg-amber-50 px-3 py-2 text-amber-950 ${compact ? "text-xs" : "text-sm"} ${className}`}
    >
      <strong className="font-semibold">Caution: </strong>
      {DEFER_TO_CODE}
    </aside>
  );
}
