import { formatRatio, ratioFails, RATIO_OVER_WORDS } from "@/components/format/ratio";

/** Utilisation as a number and a bar; over 1.00 says "fails" in words (colour only supports it). */
export function UtilisationBar({ ratio }: { ratio: number }) {
  const fails = ratioFails(ratio);
  const near = !fails && ratio > 0.9;
  const widthPct = Math.min(100, (Math.min(ratio, 1.5) / 1.5) * 100);
  const tone = fails ? "bg-red-600" : near ? "bg-amber-500" : "bg-accent-600";
  return (
    <div className="flex items-center gap-2">
      <div className="relative h-2.5 w-24 shrink-0 overflow-hidden rounded-full bg-slate-200 sm:w-32" aria-hidden>
        <div className={`h-full ${tone}`} style={{ width: `${widthPct}%` }} />
        {/* the 1.0 line sits at two thirds of the bar (the bar runs to 1.5) */}
        <div className="absolute inset-y-0 left-2/3 w-px bg-slate-700" />
      </div>
      <span className={`tabular-nums text-sm ${fails ? "font-semibold text-red-700" : "text-slate-800"}`}>
        {formatRatio(ratio)} {fails ? RATIO_OVER_WORDS : near ? "close" : "OK"}
      </span>
    </div>
  );
}
