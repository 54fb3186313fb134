/**
 * The as-built log: a hole shallower or narrower than specified, or ground that contradicts the
 * presumed soil, puts the design on hold and e-mails the approving engineer and the designer;
 * only an engineer clears the hold. Photos go to the S3 stand-in.
 */
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { recordAsBuiltAction } from "@/app/(workspace)/field/[revisionId]/actions";
import { clearHoldAction } from "@/app/(workspace)/reviews/[revisionId]/actions";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { getObject } from "@/app/_lib/storage";
import { db } from "@/db/client";
import { openHolds } from "@/db/queries/holds";
import { mailTo } from "../support/mailbox";
import { DEMO_PASSWORD } from "../support/review-fixtures";
import { actAs, jsonRequest, outcomeOf, params } from "../support/next-context";
import { DESIGNER, ENGINEER, INSTALLER, makeDesign, userId } from "../support/review-fixtures";

async function approved() {
  const d = await makeDesign();
  await actAs(DESIGNER);
  await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId: d.revisionId }));
  await actAs(ENGINEER);
  await review(jsonRequest("POST", "/x", { decision: "approve", password: DEMO_PASSWORD }), params({ revisionId: d.revisionId }));
  const result = (await db("revisions").where({ id: d.revisionId }).first("result")).result;
  return { ...d, depthIn: result.footing.depthIn as number, diameterIn: result.footing.diameterIn as number };
}

function form(fields: Record<string, string>, photos: File[] = []) {
  const f = new FormData();
  for (const [k, v] of Object.entries(fields)) f.append(k, v);
  for (const p of photos) f.append("photos", p);
  return f;
}

async function record(email: string, fields: Record<string, string>, photos: File[] = []) {
  await actAs(email);
  return outcomeOf(() => recordAsBuiltAction({}, form(fields, photos)));
}

describe("as-built entries and holds", () => {
  it("records a hole as specified, with a photo in object storage, and raises no hold", async () => {
    const d = await approved();
    // A real JPEG: the upload policy reads the image header, so a bare signature is refused.
    const jpeg = new Uint8Array(await sharp({ create: { width: 40, height: 30, channels: 3, background: { r: 100, g: 100, b: 100 } } }).jpeg().toBuffer());
    const photo = new File([jpeg], "hole-p1.jpg", { type: "image/jpeg" });
    const out = await record(INSTALLER, { revisionId: d.revisionId, postId: "P1", measuredDiameterIn: String(d.diameterIn), measuredDepthIn: String(d.depthIn + 2), groundFound: "as_expected", notes: "Clean hole." }, [photo]);
    expect(out).toMatchObject({ kind: "value", value: { ok: true } });
    const entry = await db("as_built_entries").where({ revision_id: d.revisionId }).first();
    expect(entry).toMatchObject({ post_id: "P1", measured_depth_in: d.depthIn + 2, ground_found: "as_expected" });
    expect(entry.photo_keys).toHaveLength(1);
    const stored = await getObject(entry.photo_keys[0]);
    expect(stored.contentType).toBe("image/jpeg");
    expect(stored.body).toEqual(jpeg);
    expect(await openHolds(d.designId)).toEqual([]);
  });

  it("puts the design on hold for a hole shallower than specified and e-mails engineer and designer", async () => {
    const d = await approved();
    const out = await record(INSTALLER, { revisionId: d.revisionId, postId: "P2", measuredDiameterIn: String(d.diameterIn), measuredDepthIn: String(d.depthIn - 6), groundFound: "as_expected" });
    expect(out).toMatchObject({ kind: "value", value: { ok: true, message: expect.stringMatching(/ON HOLD/) } });
    const holds = await openHolds(d.designId);
    expect(holds).toHaveLength(1);
    expect(holds[0].reason).toContain(`Hole P2 is ${d.depthIn - 6} in deep, shallower than the ${d.depthIn} in specified.`);
    for (const who of [ENGINEER, DESIGNER]) {
      const mail = await mailTo(who, { subject: /^On hold: / });
      expect(mail.text).toContain(`shallower than the ${d.depthIn} in specified`);
      expect(mail.text).toContain(`/reviews/${d.revisionId}`);
    }
  });

  it.each(["rock", "water", "fill", "caving"])("puts the design on hold when %s is found", async (ground) => {
    const d = await approved();
    await record(INSTALLER, { revisionId: d.revisionId, postId: "P1", measuredDiameterIn: String(d.diameterIn), measuredDepthIn: String(d.depthIn), groundFound: ground });
    const holds = await openHolds(d.designId);
    expect(holds).toHaveLength(1);
    expect(holds[0].reason).toMatch(/contradicts the presumed soil/);
  });

  it("names the field and range for bad measurements, keeps what was typed, and saves nothing", async () => {
    const d = await approved();
    const out = await record(INSTALLER, { revisionId: d.revisionId, postId: "P1", measuredDiameterIn: "2", measuredDepthIn: "", groundFound: "lava" });
    expect(out.kind).toBe("value");
    const value = (out as { value: { fieldErrors: Record<string, string[]>; values: Record<string, string> } }).value;
    expect(value.fieldErrors.measuredDiameterIn[0]).toBe("Measured diameter must be between 4 and 120 in");
    expect(value.fieldErrors.measuredDepthIn[0]).toMatch(/Measured depth must be a number between 1 and 720 in/);
    expect(value.fieldErrors.groundFound[0]).toMatch(/as expected, rock, water, fill, caving/);
    expect(value.values.measuredDiameterIn).toBe("2");
    const unknownPost = await record(INSTALLER, { revisionId: d.revisionId, postId: "P9", measuredDiameterIn: "30", measuredDepthIn: "90", groundFound: "as_expected" });
    expect(unknownPost).toMatchObject({ value: { fieldErrors: { postId: ["Post must be one of P1, P2"] } } });
    expect(await db("as_built_entries").where({ revision_id: d.revisionId })).toEqual([]);
  });

  it("refuses an as-built entry on a revision that is not approved", async () => {
    const d = await makeDesign();
    const out = await record(INSTALLER, { revisionId: d.revisionId, postId: "P1", measuredDiameterIn: "30", measuredDepthIn: "90", groundFound: "as_expected" });
    expect(out).toMatchObject({ value: { message: "As-built entries are recorded only against an approved revision." } });
  });

  it("lets only an engineer clear a hold, with a note", async () => {
    const d = await approved();
    await record(INSTALLER, { revisionId: d.revisionId, postId: "P1", measuredDiameterIn: String(d.diameterIn - 6), measuredDepthIn: String(d.depthIn), groundFound: "as_expected" });
    const [hold] = await openHolds(d.designId);
    expect(hold.reason).toMatch(/narrower than the/);
    for (const who of [INSTALLER, DESIGNER]) {
      await actAs(who);
      expect(await outcomeOf(() => clearHoldAction({}, form({ holdId: hold.id, note: "ok" })))).toEqual({ kind: "status", status: 403 });
    }
    await actAs(ENGINEER);
    expect(await outcomeOf(() => clearHoldAction({}, form({ holdId: hold.id, note: "" })))).toMatchObject({ value: { fieldErrors: { note: [expect.stringMatching(/how the hold was resolved/)] } } });
    expect(await outcomeOf(() => clearHoldAction({}, form({ holdId: hold.id, note: "Hole re-bored to 30 in and inspected.", confirm: "yes" })))).toMatchObject({ value: { ok: true } });
    expect(await openHolds(d.designId)).toEqual([]);
    expect(await outcomeOf(() => clearHoldAction({}, form({ holdId: hold.id, note: "again", confirm: "yes" })))).toMatchObject({ value: { message: "This hold was already cleared." } });
  });
});
