import { ScrollRegion } from "@/components/ui/scroll-region";

/** A plain table of text, as the review page and the PDF report both show it (app/_lib/review/report-model.ts builds them). */
export interface Table {
  title: string;
  columns: string[];
  rows: string[][];
  note?: string;
}

/** "112 rows", "1 row": the count a collapsed table shows on its closed summary. */
export const rowCount = (n: number, noun = "row", plural = `${noun}s`) => `${n.toLocaleString("en-US")} ${n === 1 ? noun : plural}`;

/**
 * A report table on screen: scrolls sideways inside its own box on a phone rather than squeezing
 * the numbers or widening the page. `collapsed` puts the rows behind a <details> whose summary gives
 * their count, closed at first: it opens without JavaScript and from the keyboard, and a long table
 * (the 100-odd rows of loads per post) no longer pushes what a reviewer reads first off the screen.
 */
export function PlainTable({ table, numericFrom = 1, id, collapsed = false, noun, plural }: { table: Table; numericFrom?: number; id?: string; collapsed?: boolean; noun?: string; plural?: string }) {
  const body = (
    <ScrollRegion label={`${table.title} table`} className="mt-3">
      <table className="min-w-full text-sm">
        <thead>
          <tr className="border-b border-slate-200 text-left text-xs uppercase tracking-wide text-slate-600">
            {table.columns.map((c, i) => <th key={c} scope="col" className={`px-2 py-1 font-medium ${i >= numericFrom ? "text-right" : ""}`}>{c}</th>)}
          </tr>
        </thead>
        <tbody>
          {table.rows.map((row, r) => (
            <tr key={r} className="border-b border-slate-100 last:border-0">
              {row.map((cell, i) => <td key={i} className={`px-2 py-1 align-top ${i >= numericFrom ? "text-right tabular-nums" : ""} ${cell === "FAILS" ? "font-bold text-red-700" : ""}`}>{cell}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
  return (
    <section aria-labelledby={id} className="rounded-lg border border-slate-200 bg-white p-4">
      <h2 id={id} className="text-base font-semibold">{table.title}</h2>
      {table.note ? <p className="mt-1 text-sm text-slate-600">{table.note}</p> : null}
      {!table.rows.length ? null : collapsed ? (
        <details data-rows={table.rows.length} className="mt-2">
          <summary className="cursor-pointer text-sm font-medium text-accent-800 hover:underline">Show the table ({rowCount(table.rows.length, noun, plural)})</summary>
          {body}
        </details>
      ) : body}
    </section>
  );
}
