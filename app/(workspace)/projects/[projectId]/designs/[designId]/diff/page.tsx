import type { Metadata } from "next";
import Link from "next/link";
import { AccessError, requireUser } from "@/app/_lib/auth";
import { designFor, projectFor, revisionFor } from "@/app/_lib/designs";
import { forPage, refusable } from "@/app/_lib/page-access";
import { inputChanges, resultChanges, type DiffRow, type DiffValue } from "@/components/design/revision-diff";
import { inputValueText } from "@/components/design/input-values";
import { formatBags, formatQuantity, type UnitSystem } from "@/components/format/quantity";
import { RatioText } from "@/components/format/ratio-text";
import { parseUnitSystem } from "@/components/format/unit-preference";
import { readerUnits } from "@/app/_lib/unit-preference";
import { revisionNoteIn } from "@/components/format/revision-note";
import { Caution } from "@/components/ui/caution";
import { revisionNumbers } from "@/db/queries/revisions";
import { shortDateTime } from "@/components/ui/dates";

export const metadata: Metadata = { title: "Compare revisions" };
type Props = { params: Promise<{ projectId: string; designId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

function show(v: DiffValue, row: DiffRow, units: UnitSystem, inputs: boolean): React.ReactNode {
  if (inputs) return inputValueText(row.path, v, units);
  if (v === null || v === undefined || v === "") return "—";
  if (typeof v === "boolean") return v ? "Yes" : "No";
  if (typeof v === "number" && row.ratio) return <RatioText ratio={v} />;
  if (typeof v === "number" && row.bagLb) return formatBags(v, row.bagLb, units);
  if (typeof v === "number" && row.unit) return formatQuantity(v, row.unit, units);
  return String(v);
}

function DiffTable({ rows, units, caption, empty, inputs = false }: { rows: DiffRow[]; units: UnitSystem; caption: string; empty: string; inputs?: boolean }) {
  if (rows.length === 0) return <p className="text-sm text-slate-600">{empty}</p>;
  return (
    <div className="overflow-x-auto rounded-lg border border-slate-200 bg-white">
      <table className="min-w-full text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-slate-50"><tr><th scope="col" className="px-3 py-2 text-left text-xs font-semibold text-slate-600">What</th><th scope="col" className="px-3 py-2 text-left text-xs font-semibold text-slate-600">Was</th><th scope="col" className="px-3 py-2 text-left text-xs font-semibold text-slate-600">Now</th></tr></thead>
        <tbody className="divide-y divide-slate-100">
          {rows.map((r) => (
            <tr key={r.path}>
              <th scope="row" className="px-3 py-2 text-left font-medium text-slate-800">{r.label}</th>
              <td className="px-3 py-2 tabular-nums text-slate-600 line-through decoration-slate-300">{show(r.from, r, units, inputs)}</td>
              <td className="px-3 py-2 font-semibold tabular-nums text-slate-900">{show(r.to, r, units, inputs)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** What changed between two revisions, in inputs and in results (`?from=&to=`, defaults: the two latest). */
async function DiffPage({ params, searchParams }: Props) {
  const { projectId, designId } = await params;
  const search = await searchParams;
  const one = (k: string) => (Array.isArray(search[k]) ? search[k][0] : search[k]);
  const path = `/projects/${projectId}/designs/${designId}`;
  // ?units= (the form below) wins; else the reader's preference, as on every other page.
  const units: UnitSystem = one("units") ? parseUnitSystem(one("units")) : await readerUnits();
  const { project, design, numbers, from, to, timeZone } = await forPage(async () => {
    const u = await requireUser();
    const p = await projectFor(u, projectId, { engaged: true });
    const d = await designFor(u, designId, { engaged: true });
    if (d.projectId !== p.id) throw new AccessError(404, "That design was not found.");
    const list = await revisionNumbers(d.id);
    const toId = one("to") ?? list[0]?.id;
    const fromId = one("from") ?? list[1]?.id ?? list[0]?.id;
    const load = async (id: string) => {
      const r = await revisionFor(u, id, { engaged: true });
      if (r.designId !== d.id) throw new AccessError(404, "That revision was not found.");
      return r;
    };
    return { project: p, design: d, numbers: list, from: await load(fromId), to: await load(toId), timeZone: u.timeZone };
  }, path + "/diff");

  const inputs = inputChanges(from.input, to.input);
  const results = resultChanges(from.result, to.result, units);
  const select = (name: string, value: string) => (
    <select name={name} defaultValue={value} className="rounded-md border border-slate-300 bg-white px-2 py-1.5 text-sm">
      {numbers.map((n) => <option key={n.id} value={n.id}>Revision {n.number}</option>)}
    </select>
  );

  return (
    <>
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link href={`/projects/${project.id}`} className="text-accent-800 hover:underline">{project.name}</Link> <span className="text-slate-600">/</span>{" "}
        <Link href={path} className="text-accent-800 hover:underline">{design.name}</Link>
      </nav>
      <h1 className="mt-2 text-2xl font-semibold">Revision {from.number} → revision {to.number}</h1>
      <form method="get" className="mt-3 flex flex-wrap items-end gap-3 text-sm">
        <label className="space-y-1"><span className="block text-xs font-medium text-slate-600">From</span>{select("from", from.id)}</label>
        <label className="space-y-1"><span className="block text-xs font-medium text-slate-600">To</span>{select("to", to.id)}</label>
        <label className="space-y-1"><span className="block text-xs font-medium text-slate-600">Units</span>
          <select name="units" defaultValue={units} className="rounded-md border border-slate-300 bg-white px-2 py-1.5 text-sm"><option value="imperial">US units</option><option value="metric">Metric</option></select>
        </label>
        <button type="submit" className="rounded-md border border-slate-300 bg-white px-3 py-1.5 hover:bg-slate-50">Compare</button>
      </form>
      <div className="mt-3 grid gap-2 text-sm text-slate-600 sm:grid-cols-2">
        <p><strong>Rev {from.number}</strong> · {from.authorName} · {shortDateTime(from.createdAt, timeZone)}{from.note ? ` — “${revisionNoteIn(from.note, units)}”` : ""}</p>
        <p><strong>Rev {to.number}</strong> · {to.authorName} · {shortDateTime(to.createdAt, timeZone)}{to.note ? ` — “${revisionNoteIn(to.note, units)}”` : ""}</p>
      </div>

      <section aria-labelledby="inputs-heading" className="mt-6 space-y-2">
        <h2 id="inputs-heading" className="text-lg font-semibold">Inputs changed ({inputs.length})</h2>
        <DiffTable rows={inputs} units={units} caption="Inputs changed" empty="No input changed." inputs />
      </section>
      <section aria-labelledby="results-heading" className="mt-6 space-y-2">
        <h2 id="results-heading" className="text-lg font-semibold">Results changed ({results.changed.length})</h2>
        <DiffTable rows={results.changed} units={units} caption="Results changed" empty="No result changed." />
        {results.unchanged.length > 0 ? (
          <details className="text-sm"><summary className="cursor-pointer text-slate-600">Unchanged results ({results.unchanged.length})</summary><div className="mt-2"><DiffTable rows={results.unchanged} units={units} caption="Unchanged results" empty="" /></div></details>
        ) : null}
      </section>
      <Caution className="mt-8" />
    </>
  );
}

// Its 404/403 with the words in the server HTML (app/_lib/page-access.tsx).
export default refusable(DiffPage);
