import { ScrollRegion } from "@/components/ui/scroll-region";

/** A plain table of text, as the review page and the PDF report both show it (app/_lib/review/report-model.ts builds them). */
export interface Table {
  title: string;
  columns: string[];
  rows: string[][];
  note?: string;
}

/** A report table on screen: scrolls sideways on a phone rather than squeezing the numbers. */
export function PlainTable({ table, numericFrom = 1, id }: { table: Table; numericFrom?: number; id?: string }) {
  return (
    <section aria-labelledby={id} className="rounded-lg border border-slate-200 bg-white p-4">
      <h2 id={id} className="text-base font-semibold">{table.title}</h2>
      {table.note ? <p className="mt-1 text-sm text-slate-600">{table.note}</p> : null}
      {table.rows.length ? (
        <ScrollRegion label={`${table.title} table`} className="mt-3">
          <table className="min-w-full text-sm">
            <thead>
              <tr className="border-b border-slate-200 text-left text-xs uppercase tracking-wide text-slate-500">
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
      ) : null}
    </section>
  );
}
