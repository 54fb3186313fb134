import type pg from "pg";

/**
 * Grows a seeded database with generated rows, in SQL (generate_series), so ×1000 takes minutes,
 * not hours. Growth is counted in units: one unit is 22 projects, one criteria card, 66 designs,
 * 660 revisions, 66 reviews, 1,100 audit events, 22 uploads and one open hold. ×1000 is then
 * 22,000 projects, 66,000 designs, 660,000 revisions, 66,000 reviews and 1.1 million audit events
 * across 50 organisations, the demo organisation holding every tenth unit (a tenth of it).
 *
 * Every revision carries a copy of a real seeded revision's input and result JSON (the footing
 * depth varied per row so sorting by it means something), so stored sizes and the cost of reading
 * JSON are those of real rows. Ids are md5-derived from the unit and position, so a later step can
 * refer to an earlier step's rows without lookup tables, and growth is additive: ×100 is units
 * 0–99, ×1000 adds units 100–999 to the same database. In each demo unit, the seeded outside
 * engineer holds an accepted engagement on one project and reviews its three designs.
 */

export const DEMO_ORG_ID = "0f5e1c2a-0000-4000-8000-000000000001";
export const DEMO_PROJECT_ID = "0f5e1c2a-0000-4000-8000-000000000201";
export const BENCH_ORGS = 50;

/** The design in the demo project whose revision count grows with the data (1 per unit: 1,000 at ×1000). */
export const BIG_DESIGN_ID_SQL = "md5('bench-big-design')::uuid";

/** Organisations, people and the JSON template; run once, on the seeded database. */
export async function prepare(client: pg.Client): Promise<void> {
  await client.query(`
    CREATE SCHEMA bench;
    CREATE FUNCTION bench.org_of(u int) RETURNS int IMMUTABLE LANGUAGE sql AS $$ SELECT CASE WHEN u % 10 = 0 THEN 0 ELSE 2 + u % ${BENCH_ORGS - 2} END $$;

    INSERT INTO organisations (id, name)
      SELECT md5('bench-org-' || n)::uuid, 'Generated contractor ' || n || ' (bench)' FROM generate_series(2, ${BENCH_ORGS - 1}) n;
    INSERT INTO users (id, email, name, password_hash)
      SELECT md5('bench-' || r || '-' || n)::uuid, r || n || '@bench.pierwise.test', initcap(r) || ' ' || n || ' (bench)',
             (SELECT password_hash FROM users WHERE email = 'admin@demo.pierwise.test')
      FROM generate_series(2, ${BENCH_ORGS - 1}) n CROSS JOIN unnest(ARRAY['admin', 'designer', 'engineer']) r;
    INSERT INTO memberships (organisation_id, user_id, roles)
      SELECT md5('bench-org-' || n)::uuid, md5('bench-' || r || '-' || n)::uuid, ARRAY[r::member_role]
      FROM generate_series(2, ${BENCH_ORGS - 1}) n CROSS JOIN unnest(ARRAY['admin', 'designer', 'engineer']) r;
    INSERT INTO engineer_licences (user_id, licence_number, state, expires_on)
      SELECT md5('bench-engineer-' || n)::uuid, 'PE-BENCH-' || n, 'CO', '2030-12-31' FROM generate_series(2, ${BENCH_ORGS - 1}) n;

    -- n = 0 is the demo organisation (its seeded people do its work), n >= 2 the generated ones.
    CREATE TABLE bench.orgs AS
      SELECT 0 AS n, '${DEMO_ORG_ID}'::uuid AS id,
             (SELECT id FROM users WHERE email = 'admin@demo.pierwise.test') AS admin,
             (SELECT id FROM users WHERE email = 'designer@demo.pierwise.test') AS designer,
             (SELECT id FROM users WHERE email = 'engineer@demo.pierwise.test') AS engineer,
             -- The outside engineer (seeded when engagements exist) reviews one project of each demo unit.
             (SELECT id FROM users WHERE email = 'engineer@outside.pierwise.test') AS outside
      UNION ALL
      SELECT n, md5('bench-org-' || n)::uuid, md5('bench-admin-' || n)::uuid, md5('bench-designer-' || n)::uuid, md5('bench-engineer-' || n)::uuid, NULL::uuid
      FROM generate_series(2, ${BENCH_ORGS - 1}) n;
    ALTER TABLE bench.orgs ADD PRIMARY KEY (n);

    -- A real revision's JSON (the demo's latest seeded revision) and a real card's values.
    CREATE TABLE bench.template AS
      SELECT r.input, r.result, r.engine_version, c.values AS card_values, c.sources AS card_sources
      FROM revisions r JOIN designs d ON d.id = r.design_id JOIN projects p ON p.id = d.project_id
      JOIN criteria_cards c ON c.id = p.criteria_card_id
      WHERE r.organisation_id = '${DEMO_ORG_ID}' ORDER BY r.created_at DESC, r.number DESC LIMIT 1;

    -- 48 copies of the result with footing depths 30–77 in: rows copy one of these already-stored
    -- (compressed) values instead of building and compressing 14 kB of JSON each.
    CREATE TABLE bench.results AS
      SELECT d AS depth, jsonb_set(t.result, '{footing,depthIn}', to_jsonb(30 + d)) AS result FROM bench.template t CROSS JOIN generate_series(0, 47) d;
    ALTER TABLE bench.results ADD PRIMARY KEY (depth);

    INSERT INTO designs (id, project_id, organisation_id, name, created_by)
      SELECT ${BIG_DESIGN_ID_SQL}, '${DEMO_PROJECT_ID}', '${DEMO_ORG_ID}', 'Long-lived array (bench)', designer FROM bench.orgs WHERE n = 0;
  `);
}

/** Tables the generator fills: the ones whose triggers and secondary indexes a bulk load sets aside. */
const GROWN_TABLES = ["criteria_cards", "projects", "designs", "revisions", "engagements", "reviews", "review_comments", "project_files", "design_holds", "audit_events"];

export interface GrowOptions {
  /**
   * For the benchmark's own throwaway cluster, as the superuser: triggers (foreign-key checks
   * included) are off while the rows go in, and the secondary indexes of the grown tables are
   * dropped first and rebuilt after (what a bulk load does); the columns the triggers keep
   * (projects.design_count, designs.approved_revision_id / approved_at, projects.criteria_jurisdiction,
   * organisations.project_count, designs.revision_count) are then set in one
   * statement each. The rows are the same as without it. `extra` connections take a share of the
   * units each, so the load uses every core.
   */
  bulk?: { extra: pg.Client[] };
}

/** The INSERT statements of units [from, to), in dependency order. */
function statements(from: number, to: number, verifiable: boolean, engaging: boolean, reviewDesign: boolean, reviewProject: boolean): string[] {
  const units = `generate_series(${from}, ${to - 1}) u`;
  // Reviews carry their revision's design and number once 20261204100000 ran (a trigger fills them,
  // and a bulk load has triggers off, so the rows name them; the trigger would write the same).
  // And their design's project once 20261205100000 ran (the same trigger fills it).
  const designColumns = (reviewDesign ? ", design_id, revision_number" : "") + (reviewProject ? ", project_id" : "");
  const designValues = (reviewDesign ? ", md5('d' || u || '-' || k || '-' || j)::uuid, CASE WHEN j = 0 THEN 5 ELSE 10 END" : "")
    + (reviewProject ? ", md5('p' || u || '-' || k)::uuid" : "");
  // Approvals carry a verify code and a facts snapshot once the approval-signature migration ran.
  const verifyColumns = verifiable ? ", verify_code, facts_snapshot" : "";
  const verifyValues = verifiable
    ? `, CASE WHEN j = 0 THEN md5('code' || u || '-' || k) END,
       CASE WHEN j = 0 THEN jsonb_build_object('projectName', 'Generated site', 'projectAddress', '', 'projectState', 'CO', 'criteria', NULL) END`
    : "";
  const org = "JOIN bench.orgs o ON o.n = bench.org_of(u)";
  return [
    `INSERT INTO criteria_cards (id, organisation_id, jurisdiction, state, values, sources, created_by, created_at, updated_at)
      SELECT md5('c' || u)::uuid, o.id, 'Generated County ' || u || ' (bench)', 'CO', t.card_values, t.card_sources, o.designer,
             now() - u * interval '1 hour', now() - u * interval '1 hour'
      FROM ${units} ${org} CROSS JOIN bench.template t`,
    `INSERT INTO projects (id, organisation_id, name, address, state, notes, criteria_card_id, created_by, created_at, updated_at)
      SELECT md5('p' || u || '-' || k)::uuid, o.id,
             (ARRAY['Larkspur', 'Aspen', 'Juniper', 'Cedar', 'Willow', 'Sage', 'Pinon', 'Yucca'])[1 + k % 8] || ' '
               || (ARRAY['Meadow', 'Ridge', 'Hollow', 'Flats', 'Creek', 'Mesa', 'Bluff', 'Gulch', 'Park', 'Draw', 'Bench', 'Butte', 'Spring'])[1 + (u + k) % 13]
               || ' site ' || u || '.' || k || ' (bench)',
             (100 + k) || ' Example Road ' || u || ', Town ' || (u % 97) || ' (bench), CO', 'CO', 'Generated for the database benchmark.',
             md5('c' || u)::uuid, o.designer, now() - (u * 22 + k) * interval '7 minutes', now() - (u * 22 + k) * interval '5 minutes'
      FROM ${units} CROSS JOIN generate_series(0, 21) k ${org}`,
    `INSERT INTO designs (id, project_id, organisation_id, name, created_by, created_at)
      SELECT md5('d' || u || '-' || k || '-' || j)::uuid, md5('p' || u || '-' || k)::uuid, o.id, 'Array ' || (j + 1) || ' on ' || (2 + j * 2) || ' posts',
             o.designer, now() - (u * 22 + k) * interval '7 minutes'
      FROM ${units} CROSS JOIN generate_series(0, 21) k CROSS JOIN generate_series(0, 2) j ${org}`,
    // j = 0: revision 5 approved; j = 1: revision 10 sent back; j = 2: revision 10 waiting for review.
    `INSERT INTO revisions (id, design_id, organisation_id, number, input, result, engine_version, content_hash, status, note, author_id, created_at)
      SELECT md5('r' || u || '-' || k || '-' || j || '-' || rn)::uuid, md5('d' || u || '-' || k || '-' || j)::uuid, o.id, rn,
             t.input, x.result, t.engine_version,
             md5('h' || u || '-' || k || '-' || j || '-' || rn) || md5('g' || u || '-' || k || '-' || j || '-' || rn),
             (CASE WHEN j = 0 AND rn = 5 THEN 'approved' WHEN j = 1 AND rn = 10 THEN 'changes_requested' WHEN j = 2 AND rn = 10 THEN 'in_review' ELSE 'draft' END)::revision_status,
             'Generated revision ' || rn, o.designer, now() - (u * 22 + k) * interval '7 minutes' + rn * interval '10 seconds'
      FROM ${units} CROSS JOIN generate_series(0, 21) k CROSS JOIN generate_series(0, 2) j CROSS JOIN generate_series(1, 10) rn ${org} CROSS JOIN bench.template t
      JOIN bench.results x ON x.depth = (u + k + j + rn) % 48`,
    `INSERT INTO revisions (id, design_id, organisation_id, number, input, result, engine_version, content_hash, status, note, author_id, created_at)
      SELECT md5('rb' || u)::uuid, ${BIG_DESIGN_ID_SQL}, o.id, u + 1, t.input, x.result, t.engine_version,
             md5('hb' || u) || md5('gb' || u), 'draft', 'Generated revision ' || (u + 1), o.designer, now() - interval '1 day' + u * interval '1 second'
      FROM ${units} JOIN bench.orgs o ON o.n = 0 CROSS JOIN bench.template t JOIN bench.results x ON x.depth = u % 48`,
    ...(engaging ? [`INSERT INTO engagements (organisation_id, project_id, email, status, engineer_user_id, token_hash, invited_by, responded_at)
      SELECT o.id, md5('p' || u || '-0')::uuid, 'engineer@outside.pierwise.test', 'accepted', o.outside, md5('eh' || u) || md5('eg' || u), o.designer, now()
      FROM ${units} ${org} WHERE o.outside IS NOT NULL`] : []),
    `INSERT INTO reviews (id, revision_id, organisation_id, engineer_id, submitted_by, submitted_at, decision, decided_by, decided_at,
                          engineer_name, licence_number, licence_state, licence_expires_on${verifyColumns}${designColumns})
      SELECT md5('v' || u || '-' || k || '-' || j)::uuid, md5('r' || u || '-' || k || '-' || j || '-' || (CASE WHEN j = 0 THEN 5 ELSE 10 END))::uuid,
             o.id, coalesce(CASE WHEN k = 0 THEN o.outside END, o.engineer), o.designer, now() - (u * 22 + k) * interval '7 minutes' + interval '2 minutes',
             (CASE j WHEN 0 THEN 'approve' WHEN 1 THEN 'request_changes' END)::review_decision,
             CASE WHEN j < 2 THEN coalesce(CASE WHEN k = 0 THEN o.outside END, o.engineer) END, CASE WHEN j < 2 THEN now() - (u * 22 + k) * interval '7 minutes' + interval '4 minutes' END,
             CASE WHEN j < 2 THEN 'Generated Engineer, P.E.' END, CASE WHEN j = 0 THEN 'PE-BENCH' END, CASE WHEN j = 0 THEN 'CO' END,
             CASE WHEN j = 0 THEN date '2030-12-31' END${verifyValues}${designValues}
      FROM ${units} CROSS JOIN generate_series(0, 21) k CROSS JOIN generate_series(0, 2) j ${org}`,
    `INSERT INTO review_comments (review_id, field_path, body, author_id)
      SELECT md5('v' || u || '-' || k || '-1')::uuid, 'site.windSpeedMph', 'Confirm the wind speed against the county table.', o.engineer
      FROM ${units} CROSS JOIN generate_series(0, 21) k ${org}`,
    `INSERT INTO project_files (project_id, organisation_id, kind, original_name, content_type, size_bytes, object_key, description, uploaded_by)
      SELECT md5('p' || u || '-' || k)::uuid, o.id, 'document', 'soil-report-' || u || '-' || k || '.pdf', 'application/pdf', 250000,
             'bench/' || u || '/' || k, 'Generated upload', o.designer
      FROM ${units} CROSS JOIN generate_series(0, 21) k ${org}`,
    `INSERT INTO design_holds (design_id, organisation_id, revision_id, reason, raised_by)
      SELECT md5('d' || u || '-0-0')::uuid, o.id, md5('r' || u || '-0-0-5')::uuid, 'Generated hold: rock at 30 in', o.engineer
      FROM ${units} ${org}`,
    `INSERT INTO audit_events (organisation_id, actor_user_id, action, subject, detail, ip, at)
      SELECT o.id, CASE WHEN i % 3 = 0 THEN o.admin ELSE o.designer END,
             (ARRAY['sign-in', 'sign-out', 'sign-in-failed', 'role-changed', 'invitation-sent', 'licence-saved'])[1 + i % 6],
             'person' || (i % 40) || '@bench.pierwise.test', CASE WHEN i % 6 = 3 THEN '{"from":["designer"],"to":["designer","admin"]}'::jsonb ELSE '{}'::jsonb END,
             '192.0.2.' || (i % 250), now() - ((u * 1100 + i) * interval '37 seconds')
      FROM ${units} CROSS JOIN generate_series(0, 1099) i ${org}`,
  ];
}

/** Adds units [from, to) of generated rows, then VACUUM ANALYZE so plans are those of a settled database. */
export async function grow(client: pg.Client, from: number, to: number, options: GrowOptions = {}): Promise<void> {
  if (to <= from) return;
  const verifiable = (await client.query("SELECT 1 FROM information_schema.columns WHERE table_name = 'reviews' AND column_name = 'verify_code'")).rowCount === 1;
  // Once engagements exist, the seeded outside engineer is engaged on one project of each demo unit.
  const engaging = (await client.query("SELECT 1 FROM bench.orgs WHERE outside IS NOT NULL")).rowCount === 1;
  const reviewDesign = (await client.query("SELECT 1 FROM information_schema.columns WHERE table_name = 'reviews' AND column_name = 'design_id'")).rowCount === 1;
  const reviewProject = (await client.query("SELECT 1 FROM information_schema.columns WHERE table_name = 'reviews' AND column_name = 'project_id'")).rowCount === 1;
  const started = Date.now();
  const seconds = (since: number) => `${((Date.now() - since) / 1000).toFixed(1)} s`;
  const notes: string[] = [];
  const clients = options.bulk ? [client, ...options.bulk.extra] : [client];
  let indexes: { name: string; def: string }[] = [];
  if (options.bulk) {
    // Secondary indexes only: primary keys and unique constraints stay (foreign keys and ON CONFLICT need them).
    indexes = (await client.query<{ name: string; def: string }>(
      `SELECT i.indexrelid::regclass::text AS name, pg_get_indexdef(i.indexrelid) AS def
       FROM pg_index i JOIN pg_class t ON t.oid = i.indrelid
       WHERE t.relnamespace = 'public'::regnamespace AND t.relname = ANY($1)
         AND NOT EXISTS (SELECT 1 FROM pg_constraint c WHERE c.conindid = i.indexrelid)`, [GROWN_TABLES])).rows;
    for (const { name } of indexes) await client.query(`DROP INDEX ${name}`);
    for (const c of clients) await c.query("SET session_replication_role = replica");
  }
  // Each connection takes a contiguous share of the units; a unit's rows refer only to rows of the same unit.
  const shares = clients.map((_, i) => [from + Math.floor(((to - from) * i) / clients.length), from + Math.floor(((to - from) * (i + 1)) / clients.length)]);
  const took = new Map<string, number>();
  await Promise.all(clients.map(async (c, i) => {
    const [a, b] = shares[i];
    if (b <= a) return;
    // One transaction per share: an approved revision needs its approval record by commit
    // (20261203100000), and the reviews are inserted after the revisions they refer to.
    await c.query("BEGIN");
    for (const sql of statements(a, b, verifiable, engaging, reviewDesign, reviewProject)) {
      const t = Date.now();
      await c.query(sql);
      const table = /INSERT INTO (\w+)/.exec(sql)![1];
      took.set(table, Math.max(took.get(table) ?? 0, Date.now() - t));
    }
    await c.query("COMMIT");
  }));
  notes.push(...[...took].map(([table, ms]) => `${table} ${(ms / 1000).toFixed(1)} s`));
  if (options.bulk) {
    // What the triggers would have kept: design counts, each design's newest approved revision
    // (approved when its approval was decided), each project's card jurisdiction. Set while
    // triggers are still off: the BEFORE triggers that keep these columns (20261204400000) would
    // otherwise work each row out again, and with the secondary indexes not yet rebuilt every row's
    // lookup would scan all revisions (9 minutes at ×1000 instead of seconds).
    const t = Date.now();
    await client.query(`UPDATE projects p SET design_count = n.n FROM (SELECT project_id, count(*)::int AS n FROM designs GROUP BY project_id) n
      WHERE n.project_id = p.id AND p.design_count <> n.n`);
    await client.query(`UPDATE designs d SET approved_revision_id = a.id, approved_at = a.approved_at FROM (
        SELECT DISTINCT ON (r.design_id) r.design_id, r.id, coalesce(v.decided_at, r.created_at) AS approved_at
        FROM revisions r LEFT JOIN reviews v ON v.revision_id = r.id AND v.decision = 'approve'
        WHERE r.status = 'approved' ORDER BY r.design_id, r.number DESC, v.decided_at DESC) a
      WHERE a.design_id = d.id AND d.approved_revision_id IS DISTINCT FROM a.id`);
    // Each project's copy of its card's jurisdiction, once 20261204100100 ran (the new rows only).
    if ((await client.query("SELECT 1 FROM information_schema.columns WHERE table_name = 'projects' AND column_name = 'criteria_jurisdiction'")).rowCount === 1) {
      await client.query(`UPDATE projects p SET criteria_jurisdiction = c.jurisdiction FROM criteria_cards c
        WHERE c.id = p.criteria_card_id AND p.criteria_jurisdiction IS DISTINCT FROM c.jurisdiction`);
    }
    // Each organisation's project count, once 20261205500000 ran (triggers off: set, not recounted).
    if ((await client.query("SELECT 1 FROM information_schema.columns WHERE table_name = 'organisations' AND column_name = 'project_count'")).rowCount === 1) {
      await client.query(`UPDATE organisations o SET project_count = n.n FROM (SELECT organisation_id, count(*)::int AS n FROM projects GROUP BY organisation_id) n
        WHERE n.organisation_id = o.id AND o.project_count <> n.n`);
    }
    // Each design's revision count, once 20261206100000 ran (triggers off: set, not recounted).
    if ((await client.query("SELECT 1 FROM information_schema.columns WHERE table_name = 'designs' AND column_name = 'revision_count'")).rowCount === 1) {
      await client.query(`UPDATE designs d SET revision_count = n.n FROM (SELECT design_id, count(*)::int AS n FROM revisions GROUP BY design_id) n
        WHERE n.design_id = d.id AND d.revision_count <> n.n`);
    }
    notes.push(`trigger-kept columns ${seconds(t)}`);
    for (const c of clients) await c.query("RESET session_replication_role");
    const ti = Date.now();
    await Promise.all(clients.map(async (c, i) => {
      await c.query("SET maintenance_work_mem = '512MB'");
      for (const { def } of indexes.filter((_, k) => k % clients.length === i)) await c.query(def);
    }));
    notes.push(`${indexes.length} indexes rebuilt ${seconds(ti)}`);
  }
  // What autovacuum does on its own for insert-only tables, here at once: statistics, and the
  // visibility map that lets counts use index-only scans (TOAST is skipped: nothing there to do).
  const tv = Date.now();
  await client.query("VACUUM (ANALYZE, PROCESS_TOAST FALSE)");
  notes.push(`vacuum ${seconds(tv)}`);
  console.log(`bench:db: generated units ${from}–${to - 1} in ${seconds(started)}: ${notes.join(", ")}`);
}

/** Rows per table, for the report and for the migration check (nothing may be lost). */
export async function tableCounts(client: pg.Client): Promise<Record<string, number>> {
  const tables = await client.query<{ table_name: string }>(
    "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' AND table_type = 'BASE TABLE' ORDER BY table_name",
  );
  const counts: Record<string, number> = {};
  for (const { table_name } of tables.rows) {
    counts[table_name] = Number((await client.query(`SELECT count(*) AS n FROM "${table_name}"`)).rows[0].n);
  }
  return counts;
}
