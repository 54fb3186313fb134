/**
 * Every e-mail goes out as HTML with a plain-text part: the action as a button whose link is the
 * text part's link, the project and revision named where the mail is about them, the
 * preliminary-sizing caution in both parts, and every user-typed value escaped in the HTML.
 * Read back from the SMTP stand-in after the real flows.
 */
import { describe, expect, it } from "vitest";
import { requestPasswordResetAction } from "@/app/(auth)/reset/actions";
import { recordAsBuiltAction } from "@/app/(workspace)/field/[revisionId]/actions";
import { invitationMail } from "@/app/_lib/invitation-mail";
import { POST as engageRoute } from "@/app/api/projects/[projectId]/engagements/route";
import { POST as review } from "@/app/api/revisions/[revisionId]/review/route";
import { POST as submit } from "@/app/api/revisions/[revisionId]/submit/route";
import { composeMail, MAIL_CAUTION } from "@/app/_lib/mail-template";
import { db } from "@/db/client";
import { DEFER_TO_CODE } from "@/engine";
import { formArgs } from "../support/access-matrix";
import { freshMember } from "../support/accounts";
import { freshOutsideEngineer } from "../support/engagement-fixtures";
import { firstLink, mailTo, type CaughtMail } from "../support/mailbox";
import { actAs, jsonRequest, outcomeOf, params, resetRequest } from "../support/next-context";
import { DEMO_PASSWORD, DESIGNER, ENGINEER, INSTALLER, makeDesign, userId } from "../support/review-fixtures";

const HOSTILE_PROJECT = `Ridge <script>alert("p")</script> & Sons`;
const HOSTILE_DESIGN = `Row A <img src=x onerror=alert(1)>`;

/** The button's link (the first anchor styled as a button) in the HTML part. */
function buttonLink(html: string): string {
  const m = html.match(/<a href="([^"]+)" style="display:inline-block/);
  if (!m) throw new Error("no button in the HTML part");
  return m[1].replace(/&amp;/g, "&");
}

function expectBothParts(mail: CaughtMail | { text: string; html?: string; subject?: string }, named: string[] = []) {
  expect(mail.html, `HTML part of "${mail.subject}"`).toBeTruthy();
  const html = mail.html!;
  const text = mail.text;
  // Same link behind the button as written out in the text part.
  expect(buttonLink(html)).toBe(firstLink(mail as CaughtMail));
  // The caution in both parts.
  expect(text).toContain(DEFER_TO_CODE);
  expect(html).toContain("Caution:");
  for (const n of named) expect(text).toContain(n);
  // Nothing typed by a user reaches the HTML as markup.
  expect(html).not.toMatch(/<script|<img/i);
}

describe("composeMail", () => {
  it("escapes every value in the HTML and keeps the text part plain", () => {
    const m = composeMail({
      subject: `Review: ${HOSTILE_PROJECT}`, heading: `About ${HOSTILE_PROJECT}`, project: HOSTILE_PROJECT, revision: `${HOSTILE_DESIGN}, revision 2`,
      paragraphs: [`"${HOSTILE_DESIGN}" needs you`], list: ["<b>bold</b>"], action: { label: "Open <it>", url: "https://pierwise.example.test/reviews/1?a=1&b=2" },
    });
    expect(m.html).not.toMatch(/<script|<img|<b>|<it>/);
    expect(m.html).toContain("Ridge &lt;script&gt;alert(&quot;p&quot;)&lt;/script&gt; &amp; Sons");
    expect(m.text).toContain(`Project: ${HOSTILE_PROJECT}`);
    expect(m.text).toContain(`Revision: ${HOSTILE_DESIGN}, revision 2`);
    expect(buttonLink(m.html)).toBe("https://pierwise.example.test/reviews/1?a=1&b=2");
    expect(m.text).toContain("https://pierwise.example.test/reviews/1?a=1&b=2");
    expect(m.text.endsWith(MAIL_CAUTION)).toBe(true);
  });

  it("refuses a link that is not a web address", () => {
    expect(() => composeMail({ subject: "x", heading: "x", paragraphs: [], action: { label: "x", url: "javascript:alert(1)" } })).toThrow(/scheme/);
  });

  it("the invitation has both parts", () => {
    expectBothParts(invitationMail({ inviter: "Ada <b>", organisation: HOSTILE_PROJECT, roles: ["designer"], link: "https://pierwise.example.test/invite/abc" }));
  });
});

describe("e-mails sent by the flows", () => {
  it("review requested, approved and the hold e-mail name the project and revision", async () => {
    const d = await makeDesign({ projectName: HOSTILE_PROJECT, name: HOSTILE_DESIGN });
    await actAs(DESIGNER);
    await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId: d.revisionId }));
    const requested = await mailTo(ENGINEER, { subject: /Review requested: Ridge/ });
    expectBothParts(requested, [HOSTILE_PROJECT, `${HOSTILE_DESIGN}, revision 1`]);
    expect(requested.html).toContain("&lt;script&gt;");

    await actAs(ENGINEER);
    await review(jsonRequest("POST", "/x", { decision: "approve", password: DEMO_PASSWORD }), params({ revisionId: d.revisionId }));
    const approved = await mailTo(DESIGNER, { subject: /Row A .* approved/ });
    expectBothParts(approved, [HOSTILE_PROJECT, `${HOSTILE_DESIGN}, revision 1`]);
    expect(approved.text).toContain(`/field/${d.revisionId}`);

    // A shallow hole: the hold e-mail to the engineer and the designer.
    const result = (await db("revisions").where({ id: d.revisionId }).first("result")).result;
    const form = new FormData();
    for (const [k, v] of Object.entries({ revisionId: d.revisionId, postId: "P1", measuredDiameterIn: String(result.footing.diameterIn), measuredDepthIn: String(result.footing.depthIn - 6), groundFound: "as_expected" })) form.append(k, v);
    await actAs(INSTALLER);
    await outcomeOf(() => recordAsBuiltAction({}, form));
    expectBothParts(await mailTo(ENGINEER, { subject: /^On hold: Row A/ }), [HOSTILE_PROJECT]);
  });

  it("changes requested", async () => {
    const d = await makeDesign({ projectName: HOSTILE_PROJECT, name: `${HOSTILE_DESIGN} changes` });
    await actAs(DESIGNER);
    await submit(jsonRequest("POST", "/x", { engineerId: await userId(ENGINEER) }), params({ revisionId: d.revisionId }));
    await actAs(ENGINEER);
    await review(jsonRequest("POST", "/x", { decision: "request-changes", comments: [{ fieldPath: "site.windSpeedMph", body: "Use <b>120</b>" }] }), params({ revisionId: d.revisionId }));
    const mail = await mailTo(DESIGNER, { subject: /changes needs changes/ });
    expectBothParts(mail, [HOSTILE_PROJECT]);
    expect(mail.html).toContain("Use &lt;b&gt;120&lt;/b&gt;");
  });

  it("engagement and password reset", async () => {
    const d = await makeDesign({ projectName: `${HOSTILE_PROJECT} engaged` });
    const engineer = await freshOutsideEngineer();
    await actAs(DESIGNER);
    await engageRoute(jsonRequest("POST", "/x", { email: engineer.email, message: "<script>x</script> please" }), params({ projectId: d.projectId }));
    expectBothParts(await mailTo(engineer.email, { subject: /Review engagement/ }), [`${HOSTILE_PROJECT} engaged`]);

    resetRequest({ ip: "198.51.100.77" });
    const member = await freshMember();
    await outcomeOf(() => requestPasswordResetAction(...(formArgs({ email: member.email }) as [never, FormData])));
    expectBothParts(await mailTo(member.email, { subject: /new Pierwise password/ }));
  });
});
