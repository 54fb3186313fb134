import type { Table } from "./plain-table";

/**
 * The footing checks as a reviewer reads them on any screen: check, ratio and result in three
 * columns, demand, capacity and source on a second line under the check's name, so the table fits
 * a 390 px phone without sideways scrolling. Reads the same rows as the PDF (checksTable).
 */
export function ChecksList({ table, id }: { table: Table; id: string }) {
  return (
    <section aria-labelledby={id} className="rounded-lg border border-slate-200 bg-white p-4">
      <h2 id={id} className="text-base font-semibold">{table.title}</h2>
      <table className="mt-2 w-full text-sm">
        <thead>
          <tr className="border-b border-slate-200 text-left text-xs uppercase tracking-wide text-slate-600">
            <th scope="col" className="py-1 pr-2 font-medium">Check</th>
            <th scope="col" className="px-2 py-1 text-right font-medium">Ratio</th>
            <th scope="col" className="py-1 pl-2 text-right font-medium">Result</th>
          </tr>
        </thead>
        <tbody>
          {table.rows.map(([title, demand, capacity, unit, ratio, result, source]) => (
            <tr key={title} className="border-b border-slate-100 align-top last:border-0">
              <td className="py-1.5 pr-2">
                <span className="font-medium">{title}</span>
                <span className="block text-xs text-slate-600">{demand} of {capacity} {unit} · {source}</span>
              </td>
              <td className={`px-2 py-1.5 text-right tabular-nums ${result === "FAILS" ? "font-bold text-red-700" : ""}`}>{ratio}</td>
              <td className={`py-1.5 pl-2 text-right ${result === "FAILS" ? "font-bold text-red-700" : "text-emerald-800"}`}>{result}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
