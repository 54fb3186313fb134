import { db } from "../client";
import { isUuid } from "../ids";

/**
 * Names for the ids an audit page's events are about (revisions, designs, projects of the
 * organisation), so the log reads "Barn array, revision 3" instead of an id. Only the ids shown
 * are looked up: three indexed reads of at most one page of ids.
 */
export async function auditSubjectNames(organisationId: string, subjects: (string | null)[]): Promise<Map<string, string>> {
  const ids = [...new Set(subjects.filter((s): s is string => !!s && isUuid(s)))];
  const names = new Map<string, string>();
  if (ids.length === 0) return names;
  const [revisions, designs, projects] = await Promise.all([
    db("revisions as r").join("designs as d", "d.id", "r.design_id").whereIn("r.id", ids).where("r.organisation_id", organisationId).select("r.id", "r.number", "d.name"),
    db("designs").whereIn("id", ids).where({ organisation_id: organisationId }).select("id", "name"),
    db("projects").whereIn("id", ids).where({ organisation_id: organisationId }).select("id", "name"),
  ]);
  for (const r of revisions) names.set(r.id, `${r.name}, revision ${r.number}`);
  for (const d of designs) names.set(d.id, `design ${d.name}`);
  for (const p of projects) names.set(p.id, `project ${p.name}`);
  return names;
}
