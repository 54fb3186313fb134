/**
 * Issue 17, item 12: a new design made from the criteria card starts from a passing size (the
 * smallest passing pipe in the hole "size it for me" picks), or its first revision says plainly what
 * to change. Through the API (the page's form calls the same service, tests/app/route-action-parity).
 * The cards are invented; their wind speeds sit inside the product's 85–200 mph range (engine/schema.ts).
 */
import { afterAll, describe, expect, it } from "vitest";
import { POST as createDesign } from "@/app/api/projects/[projectId]/designs/route";
import { db } from "@/db/client";
import type { CriteriaCardValues } from "@/db/queries/criteria-cards";
import { DEMO_ORG_ID } from "@/db/seeds/01_demo_accounts";
import { DEMO_PROJECT_ID } from "@/db/seeds/02_demo_projects";
import { sizeDesign, type DesignInput, type DesignResult } from "@/engine";
import { actAs, jsonRequest, params } from "../support/next-context";
import { DESIGNER, userId } from "../support/review-fixtures";

const made: { projects: string[]; cards: string[] } = { projects: [], cards: [] };
afterAll(async () => {
  await db("designs").whereIn("project_id", made.projects).delete();
  await db("projects").whereIn("id", made.projects).delete();
  await db("criteria_cards").whereIn("id", made.cards).delete();
});

async function projectWithCard(jurisdiction: string, values: CriteriaCardValues): Promise<string> {
  const author = await userId(DESIGNER);
  const [card] = await db("criteria_cards").insert({ organisation_id: DEMO_ORG_ID, jurisdiction, state: "CO", values: JSON.stringify(values), created_by: author }).returning("id");
  const [project] = await db("projects").insert({ organisation_id: DEMO_ORG_ID, name: `${jurisdiction} site`, address: "1 Test Lane (invented)", state: "CO", criteria_card_id: card.id, created_by: author }).returning("id");
  made.cards.push(card.id);
  made.projects.push(project.id);
  return project.id;
}

async function newDesignIn(projectId: string) {
  await actAs(DESIGNER);
  const response = await createDesign(jsonRequest("POST", "/", { name: "From the card" }), params({ projectId }));
  const json = await response.json();
  expect(response.status, JSON.stringify(json)).toBe(201);
  const rev = await db("revisions").where({ id: json.revisionId }).first("input", "result", "note");
  return { json, input: rev.input as DesignInput, result: rev.result as DesignResult, note: rev.note as string };
}

const failing = (r: DesignResult) => r.footing.checks.filter((c) => !c.pass).map((c) => c.title);

describe("a new design from the criteria card", () => {
  it("from the demo card (115 mph, exposure C, soil class 4): every check passes", async () => {
    const { result, note, json } = await newDesignIn(DEMO_PROJECT_ID);
    expect(failing(result)).toEqual([]);
    expect(result.footing.pass).toBe(true);
    expect(json.sizing).toMatchObject({ pass: true, advice: [] });
    expect(note).toMatch(/^Started from the Juniper Flats County \(demo\) criteria card\. Every check passes\./);
  });

  it("from a windier card whose default post fails bending: starts on the smallest pipe that passes, and says so", async () => {
    // 125 mph, exposure C, soil class 3 (the seeded Cedar Basin values, invented): the default 3½ in
    // standard pipe fails post bending there (AISC 360-16 §F8; the engine's own check below).
    const windy: CriteriaCardValues = { buildingCode: "IBC 2021", asceEdition: "7-16", riskCategory: "II", windSpeedMph: 125, exposure: "C", groundSnowPsf: 45, frostDepthIn: 42, soilClass: 3 };
    const projectId = await projectWithCard("Windy Gap County (test)", windy);
    const { input, result, note } = await newDesignIn(projectId);
    expect(input.site).toMatchObject({ windSpeedMph: 125, exposure: "C", soil: { method: "class", soilClass: 3 } });
    expect(failing(result)).toEqual([]);
    // The default pipe really fails here (what the design would have started with before).
    const before = sizeDesign({ ...input, posts: { ...input.posts, pipeSize: "3-1/2", holeDiameterIn: 24 } });
    expect(failing(before)).toContain(before.footing.checks.find((c) => c.id === "postBending")!.title);
    // The smallest: one size down fails.
    expect(input.posts.pipeSize).not.toBe("3-1/2");
    expect(typeof input.posts.holeDiameterIn).toBe("number");
    expect(note).toContain(`${input.posts.pipeSize.replace("-", " ")} in standard pipe: the smallest that passes`);
  });

  it("from a card where nothing passes on four posts: the note names what to change, and that change passes", async () => {
    // 180 mph, exposure D, soil class 5 (clay: 1,500 psf bearing, IBC 2021 Table 1806.2 [memory]).
    const extreme: CriteriaCardValues = { buildingCode: "IBC 2021", asceEdition: "7-22", riskCategory: "II", windSpeedMph: 180, exposure: "D", groundSnowPsf: 0, frostDepthIn: 12, soilClass: 5 };
    const projectId = await projectWithCard("Gale Point County (test)", extreme);
    const { input, result, note, json } = await newDesignIn(projectId);
    expect(result.footing.pass).toBe(false);
    expect(json.sizing.pass).toBe(false);
    expect(note).toContain("Fails a check at this size.");
    const advice = /Change the number of posts to (\d+)\./.exec(note);
    expect(advice, note).not.toBeNull();
    const posts = Number(advice![1]);
    expect(posts).toBeGreaterThan(input.posts.count);
    // Following the advice passes: the posts it names, in the pipe and holes it names.
    const named = /: ([\d /]+) in standard pipe in (\d+) in holes/.exec(note)!;
    const followed = sizeDesign({ ...input, posts: { ...input.posts, count: posts, pipeSize: named[1].replace(" ", "-"), holeDiameterIn: Number(named[2]) } });
    expect(failing(followed)).toEqual([]);
  });

  it("keeps an input given through the API as it is", async () => {
    await actAs(DESIGNER);
    const given = (await newDesignIn(DEMO_PROJECT_ID)).input;
    const mine = { ...given, posts: { ...given.posts, pipeSize: "2-1/2" as const, holeDiameterIn: 18 } };
    const response = await createDesign(jsonRequest("POST", "/", { name: "Mine", input: mine }), params({ projectId: DEMO_PROJECT_ID }));
    const json = await response.json();
    expect(response.status).toBe(201);
    const rev = await db("revisions").where({ id: json.revisionId }).first("input");
    expect(rev.input.posts).toMatchObject({ pipeSize: "2-1/2", holeDiameterIn: 18 });
    expect(json.sizing).toBeNull();
  });
});
