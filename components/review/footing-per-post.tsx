import { formatQuantity, type UnitSystem } from "@/components/format/quantity";
import { rowCount } from "./plain-table";

export interface PostFooting {
  id: string;
  heightAboveGradeIn: number;
  embedmentIn: number;
  postLengthIn: number;
}


/**
 * Each post's hole, embedment and post length, under the summary. Every hole has the same diameter
 * and depth (the deepest any post needs); post lengths differ on sloping ground. More than four posts
 * fold behind a <details> with their count, so the summary stays one screen on a phone.
 */
export function FootingPerPost({ posts, diameterIn, units = "imperial" }: { posts: PostFooting[]; diameterIn: number; units?: UnitSystem }) {
  // The one formatter: "52.8 in" / "1,340 mm".
  const inches = (n: number) => formatQuantity(n, "in", units);
  const table = (
    <table className="mt-2 w-full text-sm">
      <thead>
        <tr className="border-b border-current/20 text-left text-xs uppercase tracking-wide">
          <th scope="col" className="py-1 pr-2 font-medium">Post</th>
          <th scope="col" className="px-1 py-1 text-right font-medium">Hole</th>
          <th scope="col" className="px-1 py-1 text-right font-medium">Embedded</th>
          <th scope="col" className="px-1 py-1 text-right font-medium">Above grade</th>
          <th scope="col" className="py-1 pl-1 text-right font-medium">Post length</th>
        </tr>
      </thead>
      {/* A value never breaks between its number and its unit ("30 / in" at 390 px). */}
      <tbody className="tabular-nums whitespace-nowrap">
        {posts.map((p) => (
          <tr key={p.id} className="border-b border-current/10 last:border-0">
            <th scope="row" className="py-1 pr-2 text-left font-medium">{p.id}</th>
            <td className="px-1 py-1 text-right">{inches(diameterIn)}</td>
            <td className="px-1 py-1 text-right">{inches(p.embedmentIn)}</td>
            <td className="px-1 py-1 text-right">{inches(p.heightAboveGradeIn)}</td>
            <td className="py-1 pl-1 text-right">{inches(p.postLengthIn)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
  return (
    <section aria-labelledby="per-post-h" className="rounded-lg border border-slate-200 bg-white p-4">
      <h2 id="per-post-h" className="text-base font-semibold">Footing at each post</h2>
      {posts.length > 4 ? (
        <details data-rows={posts.length} className="mt-1">
          <summary className="cursor-pointer text-sm font-medium text-accent-800 hover:underline">Show every post ({rowCount(posts.length, "post")})</summary>
          {table}
        </details>
      ) : table}
    </section>
  );
}
