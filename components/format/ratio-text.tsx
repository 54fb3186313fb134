import { formatRatio, ratioFails, RATIO_OVER_WORDS } from "./ratio";

/** A ratio on screen: over 1.00 it is bold, red and says so in words (not colour alone), in one box that never splits across lines. */
export function RatioText({ ratio }: { ratio: number }) {
  if (!ratioFails(ratio)) return <span className="tabular-nums">{formatRatio(ratio)}</span>;
  return (
    <span className="font-semibold text-red-700 tabular-nums" data-ratio-over="true">
      {formatRatio(ratio)} <span className="inline-block rounded border border-red-700 px-1 text-xs font-bold whitespace-nowrap uppercase">{RATIO_OVER_WORDS}</span>
    </span>
  );
}
