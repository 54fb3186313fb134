import type { Knex } from "knex";
import { applyCriteriaCard } from "../design-defaults";
import { defaultDesignInput, designInputSchema, ENGINE_VERSION, sizeParsedDesign, twoPostDesignInput, type DesignInputDraft } from "../../engine";
import type { CriteriaCardValues, CriteriaSources } from "../queries/criteria-cards";
import { createDesignWithRevision } from "../queries/designs";
import { createRevision } from "../queries/revisions";
import { DEMO_ORG_ID, OTHER_ORG_ID } from "./01_demo_accounts";

/**
 * Invented demo projects. Every jurisdiction, site and address is made up ("(demo)" in the name).
 * The 12-module two-post design has three revisions with real edits, each sized by the engine at
 * seed time, so the revision table and the diff view have a history to show.
 */
export const DEMO_CARD_ID = "0f5e1c2a-0000-4000-8000-000000000101";
export const DEMO_SLOPE_CARD_ID = "0f5e1c2a-0000-4000-8000-000000000102";
export const DEMO_PROJECT_ID = "0f5e1c2a-0000-4000-8000-000000000201";
export const DEMO_SLOPED_PROJECT_ID = "0f5e1c2a-0000-4000-8000-000000000202";
export const OTHER_PROJECT_ID = "0f5e1c2a-0000-4000-8000-000000000203";

const checked = (source: string, checkedOn = "2026-11-20"): { source: string; checkedOn: string } => ({ source, checkedOn });
function sourcesFor(sheet: string): CriteriaSources {
  return {
    buildingCode: checked(`${sheet}, adopted codes`), asceEdition: checked(`${sheet}, adopted codes`), riskCategory: checked("IBC Table 1604.5 (utility structure, risk category II)"),
    windSpeedMph: checked(`${sheet}, wind table`), exposure: checked("Site visit: open grass field, exposure C (ASCE 7-16 §26.7.3)"),
    groundSnowPsf: checked(`${sheet}, snow table`), frostDepthIn: checked(`${sheet}, frost depth`), soilClass: checked("Presumed; no geotechnical report yet (IBC Table 1806.2)"),
  };
}

const juniperFlats: CriteriaCardValues = { buildingCode: "IBC 2021", asceEdition: "7-16", riskCategory: "II", windSpeedMph: 115, exposure: "C", groundSnowPsf: 30, frostDepthIn: 36, soilClass: 4 };
const cedarBasin: CriteriaCardValues = { buildingCode: "IBC 2021", asceEdition: "7-16", riskCategory: "II", windSpeedMph: 125, exposure: "C", groundSnowPsf: 45, frostDepthIn: 42, soilClass: 3 };

async function userId(knex: Knex, email: string): Promise<string> {
  return (await knex("users").where({ email }).first("id")).id;
}

function sized(draft: DesignInputDraft) {
  const input = designInputSchema.parse(draft);
  return { input, result: sizeParsedDesign(input), engineVersion: ENGINE_VERSION };
}

/** A design with its history: the first draft, then each edit as the next revision. */
async function designWithHistory(knex: Knex, a: { projectId: string; organisationId: string; name: string; authorId: string; steps: { draft: DesignInputDraft; note: string }[] }) {
  const [first, ...rest] = a.steps;
  const created = await createDesignWithRevision({ projectId: a.projectId, organisationId: a.organisationId, name: a.name, authorId: a.authorId, note: first.note, ...sized(first.draft) }, knex);
  let base = created.revisionId;
  for (const step of rest) {
    base = (await createRevision({ designId: created.designId, organisationId: a.organisationId, baseRevisionId: base, authorId: a.authorId, note: step.note, ...sized(step.draft) }, knex)).id;
  }
  return created.designId;
}

export async function seed(knex: Knex): Promise<void> {
  const designer = await userId(knex, "designer@demo.pierwise.test");
  const outsider = await userId(knex, "designer@other.pierwise.test");

  await knex("criteria_cards").insert([
    { id: DEMO_CARD_ID, organisation_id: DEMO_ORG_ID, jurisdiction: "Juniper Flats County (demo)", state: "CO", values: JSON.stringify(juniperFlats), sources: JSON.stringify(sourcesFor("Juniper Flats County design criteria sheet (invented)")), created_by: designer },
    { id: DEMO_SLOPE_CARD_ID, organisation_id: DEMO_ORG_ID, jurisdiction: "Cedar Basin County (demo)", state: "CO", values: JSON.stringify(cedarBasin), sources: JSON.stringify(sourcesFor("Cedar Basin County building handout (invented)")), created_by: designer },
  ]);
  await knex("projects").insert([
    { id: DEMO_PROJECT_ID, organisation_id: DEMO_ORG_ID, name: "Larkspur Meadow residence (demo)", address: "100 Example Meadow Lane, Juniper Flats (demo), CO", state: "CO", notes: "Backyard ground mount south of the barn. Owner wants the lowest edge clear of drifted snow.", criteria_card_id: DEMO_CARD_ID, created_by: designer },
    { id: DEMO_SLOPED_PROJECT_ID, organisation_id: DEMO_ORG_ID, name: "Aspen Hollow cabin (demo)", address: "200 Example Gulch Road, Cedar Basin (demo), CO", state: "CO", notes: "Hillside site: ground falls 8 % along the array and 12 % toward the front.", criteria_card_id: DEMO_SLOPE_CARD_ID, created_by: designer },
    { id: OTHER_PROJECT_ID, organisation_id: OTHER_ORG_ID, name: "Other company's site (demo)", address: "300 Example Way, Nowhere (demo), CO", state: "CO", notes: "", created_by: outsider },
  ]);

  // The 12-module, two-post design: first layout, then clearance for snow, then wider holes.
  const first = applyCriteriaCard({ ...twoPostDesignInput, projectName: "Larkspur Meadow residence (demo)" } as DesignInputDraft, juniperFlats);
  const higher = { ...first, array: { ...first.array, tiltDeg: 25, lowestEdgeClearanceIn: 30 } };
  const wider = { ...higher, posts: { ...higher.posts, holeDiameterIn: 36 } };
  await designWithHistory(knex, {
    projectId: DEMO_PROJECT_ID, organisationId: DEMO_ORG_ID, name: "12-module array on two posts", authorId: designer,
    steps: [
      { draft: first, note: "First layout: 12 modules, 2 × 6 portrait, on two 5 in posts, 30 in holes." },
      { draft: higher, note: "Owner wants 30 in clearance for drifted snow; tilt lowered to 25° to keep the top edge down." },
      { draft: wider, note: "36 in holes so the crew's auger stays shallower." },
    ],
  });
  const fourPost = applyCriteriaCard({ ...defaultDesignInput, projectName: "Larkspur Meadow residence (demo)" } as DesignInputDraft, juniperFlats);
  await designWithHistory(knex, { projectId: DEMO_PROJECT_ID, organisationId: DEMO_ORG_ID, name: "Alternative on four posts", authorId: designer, steps: [{ draft: fourPost, note: "Four 3½ in posts instead of two 5 in posts, for comparison." }] });

  const hillside = applyCriteriaCard({ ...defaultDesignInput, projectName: "Aspen Hollow cabin (demo)" } as DesignInputDraft, cedarBasin);
  const sloped = { ...hillside, site: { ...hillside.site, slopeAlongPct: 8, slopeAcrossPct: -12 } };
  await designWithHistory(knex, {
    projectId: DEMO_SLOPED_PROJECT_ID, organisationId: DEMO_ORG_ID, name: "Hillside array on four posts", authorId: designer,
    steps: [
      { draft: hillside, note: "Started from the county criteria on level ground." },
      { draft: sloped, note: "Surveyed slope: 8 % along the array, 12 % falling to the front." },
    ],
  });

  const otherInput = { ...defaultDesignInput, projectName: "Other company's site (demo)" } as DesignInputDraft;
  await designWithHistory(knex, { projectId: OTHER_PROJECT_ID, organisationId: OTHER_ORG_ID, name: "Their array", authorId: outsider, steps: [{ draft: otherInput, note: "First layout." }] });
}
