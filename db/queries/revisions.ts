import crypto from "node:crypto";
import type { Knex } from "knex";
import { db } from "../client";
import { listPage, SEARCH_COUNT_CAP, type ListPage, type ListQuery } from "./list-page";

/**
 * Revisions: every saved state of a design. A revision is written once, by `createRevision`, and
 * never updated or deleted from the app (review and approval add their own tables on top). The
 * stale-base check and the insert share one transaction with the design row locked, so two saves
 * from the same base cannot both win and a failure leaves no half revision.
 */
export { REVISION_STATUS_LABELS, type RevisionStatus } from "../revision-status";
import type { RevisionStatus } from "../revision-status";
import { isUuid } from "../ids";

export interface Revision<I = unknown, R = unknown> {
  id: string;
  designId: string;
  organisationId: string;
  number: number;
  input: I;
  result: R;
  engineVersion: string;
  contentHash: string;
  status: RevisionStatus;
  note: string;
  authorId: string | null;
  authorName: string | null;
  createdAt: Date;
}

export interface RevisionRow {
  id: string;
  number: number;
  status: RevisionStatus;
  note: string;
  authorName: string | null;
  createdAt: string;
  engineVersion: string;
  depthIn: number | null;
  diameterIn: number | null;
  pass: boolean | null;
}

/** Saving against a revision that is no longer the design's latest. */
export class StaleRevisionError extends Error {
  constructor(readonly latest: { id: string; number: number } | null) {
    super(
      latest
        ? `This design was saved by someone else as revision ${latest.number} since you opened it. Reload to see it; your typed values stay in the form until you do.`
        : "This design has no revisions to build on.",
    );
    this.name = "StaleRevisionError";
  }
}

/** JSON with object keys sorted at every level, so equal content always hashes the same. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(",")}]`;
  if (value && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(",")}}`;
  }
  return JSON.stringify(value ?? null);
}

/** sha256 over the input, the result and the engine version: what a reviewer or a field spec can quote to prove "this exact design". */
export function contentHash(input: unknown, result: unknown, engineVersion: string): string {
  return crypto.createHash("sha256").update(canonicalJson({ engineVersion, input, result })).digest("hex");
}

const columns = [
  "r.id", "r.design_id as designId", "r.organisation_id as organisationId", "r.number", "r.input", "r.result",
  "r.engine_version as engineVersion", "r.content_hash as contentHash", "r.status", "r.note", "r.author_id as authorId",
  "u.name as authorName", "r.created_at as createdAt",
];

export interface NewRevision {
  designId: string;
  organisationId: string;
  /** The revision the author started from; null only for a design's first revision. */
  baseRevisionId: string | null;
  input: unknown;
  result: unknown;
  engineVersion: string;
  note: string;
  authorId: string;
}

/**
 * The one way a revision is made. Locks the design, refuses a stale base (StaleRevisionError),
 * and inserts revision number latest + 1, all in one transaction (`conn` may be an open one).
 */
export async function createRevision(a: NewRevision, conn: Knex | Knex.Transaction = db): Promise<{ id: string; number: number; contentHash: string; createdAt: Date }> {
  return conn.transaction(async (trx) => {
    const design = await trx("designs").where({ id: a.designId, organisation_id: a.organisationId }).forUpdate().first("id");
    if (!design) throw new Error(`design ${a.designId} not found in organisation ${a.organisationId}`);
    const latest: { id: string; number: number } | undefined = await trx("revisions").where({ design_id: a.designId }).orderBy("number", "desc").first("id", "number");
    if ((latest?.id ?? null) !== a.baseRevisionId) throw new StaleRevisionError(latest ?? null);
    const hash = contentHash(a.input, a.result, a.engineVersion);
    const [row] = await trx("revisions")
      .insert({
        design_id: a.designId, organisation_id: a.organisationId, number: (latest?.number ?? 0) + 1,
        input: JSON.stringify(a.input), result: JSON.stringify(a.result), engine_version: a.engineVersion,
        content_hash: hash, note: a.note, author_id: a.authorId,
        // The time the row was written under the design lock, not when the transaction began (which
        // may be before a submission of the previous revision that this save waited for).
        created_at: trx.raw("clock_timestamp()"),
      })
      .returning(["id", "number", "created_at as createdAt"]);
    return { id: row.id, number: row.number, contentHash: hash, createdAt: row.createdAt };
  });
}

export async function getRevision<I = unknown, R = unknown>(id: string): Promise<Revision<I, R> | undefined> {
  if (!isUuid(id)) return undefined;
  return db("revisions as r").leftJoin("users as u", "u.id", "r.author_id").where("r.id", id).first(columns);
}

export async function latestRevision<I = unknown, R = unknown>(designId: string): Promise<Revision<I, R> | undefined> {
  return db("revisions as r").leftJoin("users as u", "u.id", "r.author_id").where("r.design_id", designId).orderBy("r.number", "desc").first(columns);
}

/** Every revision's id and number, newest first (for pickers such as the diff view). */
export async function revisionNumbers(designId: string): Promise<{ id: string; number: number; createdAt: Date }[]> {
  return db("revisions").where({ design_id: designId }).orderBy("number", "desc").select("id", "number", "created_at as createdAt");
}

export const REVISION_SORTS = { number: "r.number", status: "r.status", authorName: "u.name", createdAt: "r.created_at", depthIn: "r.footing_depth_in" } as const;

/** A search's count of a design's revisions stops past this many (or a page past the current one): "1–20 of 1,000+". */
export const REVISION_COUNT_CAP = SEARCH_COUNT_CAP;

/**
 * One page of a design's revisions, without the heavy input and result: the footing headline
 * comes from stored columns. Number, status and time are never null, so the (design_id, number)
 * index serves the default newest-first order; depth, either way, is served by its own index per
 * direction (migration 20261205400000).
 *
 * The total, so a view reads about a page whatever the design's history: without a search, the
 * design's `revision_count` (kept by triggers, 20261206100000; one row, exact); with one, the
 * matches counted up to REVISION_COUNT_CAP (`countCap` in tests) or a page past the current one,
 * `capped` past that, as the projects search is.
 */
export async function listRevisions(designId: string, query: ListQuery = {}, countCap = REVISION_COUNT_CAP): Promise<ListPage<RevisionRow>> {
  const base = db("revisions as r").leftJoin("users as u", "u.id", "r.author_id").where("r.design_id", designId);
  const page = await listPage<RevisionRow & { createdAt: Date }>(base, query, {
    keptCount: db("designs").where("id", designId).select("revision_count as n"),
    searchCountCap: countCap,
    sortable: REVISION_SORTS,
    defaultSort: "number",
    defaultDir: "desc",
    notNull: ["number", "status", "createdAt"],
    // Equal depths (or statuses) keep one order across pages; the depth indexes end with it.
    tieBreak: { sort: "number", column: "r.number" },
    search: ["r.note", "u.name", "r.status", "r.number"],
    select: (qb) =>
      qb.select("r.id", "r.number", "r.status", "r.note", "u.name as authorName", "r.created_at as createdAt", "r.engine_version as engineVersion",
        "r.footing_depth_in as depthIn", "r.footing_diameter_in as diameterIn", "r.footing_pass as pass"),
  });
  return { ...page, rows: page.rows.map((r) => ({ ...r, createdAt: new Date(r.createdAt).toISOString() })) };
}
