import type { ListPage } from "@/db/queries/list-page";
import type { RevisionRow } from "@/db/queries/revisions";
import { ServerDataTable } from "@/components/design/server-data-table";
import { revisionNoteIn } from "@/components/format/revision-note";
import type { UnitSystem } from "@/components/format/quantity";
import { RevisionsTableLazy } from "./revisions-table-lazy";
import { REVISIONS_TABLE, revisionColumns } from "./revision-columns";

/**
 * The editor's revisions table, below the fold: drawn on the server (links and a GET form, working
 * without JavaScript), the browser's table loads when the reader reaches for it. Its page of rows is
 * read by the page beside its access checks (page.tsx), not streamed: a streamed part stays hidden
 * without JavaScript (React moves it into place with an inline script, its later rows as separate
 * hidden parts), and the rows are ready as soon as the rest of the page anyway.
 */
export function RevisionsSection({ revisions, path, search, latestId, viewingId, timeZone, units }: {
  revisions: ListPage<RevisionRow>;
  path: string;
  search: Record<string, string | string[] | undefined>;
  latestId: string;
  viewingId: string;
  timeZone?: string;
  units: UnitSystem;
}) {
  const page = { ...revisions, rows: revisions.rows.map((r) => ({ ...r, note: revisionNoteIn(r.note, units) })) };
  const props = { basePath: path, latestId, viewingId, timeZone, units };
  return (
    <RevisionsTableLazy page={page} {...props}>
      <ServerDataTable page={page} columns={revisionColumns(props)} {...REVISIONS_TABLE} pathname={path} search={search} />
    </RevisionsTableLazy>
  );
}
