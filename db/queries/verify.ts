import { db } from "../client";
import type { FactsSnapshot } from "./reviews";

/** What the public verify page may show of one approval, and nothing more. */
export interface VerifiedApproval {
  revisionId: string;
  number: number;
  contentHash: string;
  engineerName: string;
  licenceNumber: string;
  licenceState: string;
  decidedAt: Date;
  facts: FactsSnapshot;
  diameterIn: number;
  depthIn: number;
  posts: number;
  organisationName: string;
  timeZone: string;
  contactEmail: string;
  superseded: boolean;
  onHold: boolean;
}

const json = <T>(v: unknown): T => (typeof v === "string" ? JSON.parse(v) : v) as T;

/** The approval with this verify code (codes are 16 random bytes, base64url). */
export async function approvalByCode(code: string): Promise<VerifiedApproval | undefined> {
  if (!/^[A-Za-z0-9_-]{16,64}$/.test(code)) return undefined;
  const row = await db("reviews as v")
    .join("revisions as r", "r.id", "v.revision_id")
    .join("organisations as o", "o.id", "v.organisation_id")
    .join("users as s", "s.id", "v.submitted_by")
    .where({ "v.verify_code": code, "v.decision": "approve" })
    .first(
      "r.id as revisionId", "r.number", "r.content_hash as contentHash", "v.engineer_name as engineerName",
      "v.licence_number as licenceNumber", "v.licence_state as licenceState", "v.decided_at as decidedAt",
      "v.facts_snapshot as facts", "o.name as organisationName", "o.time_zone as timeZone", "s.email as contactEmail",
      db.raw(`(r.result->'footing'->>'diameterIn')::float as "diameterIn"`),
      db.raw(`(r.result->'footing'->>'depthIn')::float as "depthIn"`),
      db.raw(`jsonb_array_length(r.result->'field'->'posts') as posts`),
      db.raw(`exists (select 1 from revisions n where n.design_id = r.design_id and n.status = 'approved' and n.number > r.number) as superseded`),
      db.raw(`exists (select 1 from design_holds h where h.design_id = r.design_id and h.cleared_at is null) as "onHold"`),
    );
  return row ? { ...row, facts: json<FactsSnapshot>(row.facts) } : undefined;
}
