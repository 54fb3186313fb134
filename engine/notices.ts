/**
 * What every result says about itself: the defer-to-code caution, the usual site-safety cautions,
 * and the editions and sections the calculation used.
 */
import type { DesignInput } from "./schema";
import { imperialText, qty, says, type QuantityText } from "./quantity-text";

export const DEFER_TO_CODE =
  "Preliminary sizing only. The local building code, the authority having jurisdiction and a licensed professional engineer govern; do not build from these numbers until a licensed engineer has reviewed and approved them.";

/** The site cautions with their numbers as quantities (screens word them in the reader's units). */
export const SITE_CAUTION_TEXTS: readonly QuantityText[] = [
  "Call before you dig: call your local utility-locate service (in the US, dial 811) and wait for buried utilities to be marked before any hole is drilled.",
  "Open holes are a fall and collapse hazard: cover or barricade them, never stand in an unshored hole deeper than your waist, and keep spoil back from the edge.",
  "Wet concrete burns skin and eyes: wear gloves and eye protection. Bags, posts and beams are heavy: lift with two people or a machine, and mind the auger's torque and pinch points.",
  "Do not lift or fasten modules in high or gusty wind: a module is a sail and can injure the crew or be torn loose.",
  "Treat module leads as live in daylight; keep connectors capped until the electrician takes over.",
  says`Check the concrete mix (at least ${qty(2500, "psi")} premix is typical; the code minimum for post backfill is ${qty(2000, "psi")}) and let it cure before loading the posts.`,
].map((c) => (typeof c === "string" ? [c] : c));

/** The site cautions in US customary words (results, CLI, plain text). */
export const SITE_CAUTIONS: string[] = SITE_CAUTION_TEXTS.map(imperialText);

export const WIND_METHOD_NOTE =
  "Wind: ASCE 7 open monoslope free-roof method (Fig. 27.3-4) for both editions. ASCE 7-22's provisions specific to ground-mounted fixed-tilt solar arrays are not implemented.";

/**
 * Wind along the rows (γ = 90°): the free-roof provisions have an along-ridge case, but its
 * coefficients could not be read from published text here, so it is not evaluated [see README].
 */
export const WIND_ALONG_ROWS_NOT_CHECKED =
  "Wind along the rows (γ = 90°, blowing parallel to the beam) was not checked: the free-roof method's along-ridge case is not evaluated, so uplift under it, the horizontal load along the beam, each post's bending about the beam's axis and the footing under that load are not covered. Have the engineer check them, or brace the rack along the row.";

/** How the posts share the array's load (result.geometry.postLoadSharing). */
export const BEAM_SHARING_CONTINUOUS =
  "Post loads are the reactions of the beam continuous over its posts (three-moment equation, rigid supports, overhangs as cantilevers); every load case is uniform along the beam, so each post's reaction factor (its share ÷ its tributary share) is the same for dead, snow and every wind case.";
export const BEAM_SHARING_TWO_POSTS = "Two posts: each carries its tributary share, which statics gives exactly (reaction factor 1).";

/** The footing-depth sections, with the 12 in minimum as a quantity. */
export const FOOTING_DEPTH_SECTIONS_TEXT: QuantityText = says`IBC §1809.4 depth of footings (${qty(12, "in")} minimum); §1809.5 frost protection`;
const FOOTING_DEPTH_SECTIONS = imperialText(FOOTING_DEPTH_SECTIONS_TEXT);

export function sectionsUsed(input: DesignInput): { asce: string; ibc: string; aisc: string; sections: string[] } {
  const e = input.site.edition;
  const lateral = input.posts.constrainedAtGrade ? "IBC §1807.3.2.2 Eq. 18-2 (constrained)" : "IBC §1807.3.2.1 Eq. 18-1 (nonconstrained)";
  const soil = input.site.soil.method === "class" ? "IBC Table 1806.2 (presumptive soil values)" : "Engineer's soil values (geotechnical report)";
  const sections = [
    `ASCE 7-${e.slice(2)} Eq. 26.10-1 velocity pressure; Table 26.10-1 Kz; §26.8 Kzt; §26.9 Ke; Table 26.6-1 Kd`,
    "ASCE 7-16 §26.11 gust-effect factor G = 0.85 (rigid)",
    "ASCE 7-16 §27.3.2 Fig. 27.3-4 open monoslope free roof, net pressure coefficients CN",
    `ASCE 7-${e.slice(2)} Ch. 7 snow: Eq. 7.3-1 pf, §7.4 Fig. 7.4-1 Cs; minimum snow below 15°: ASCE 7-16 §7.3.4 rule${e === "7-22" ? " (used for 7-22 too: see warnings)" : ""}`,
    `ASCE 7-${e.slice(2)} §2.4.1 ASD load combinations`,
    lateral,
    soil,
    ...(input.posts.isolatedPoleIncrease ? ["IBC §1806.3.4 lateral value doubled for an isolated pole (designer's choice)"] : []),
    "IBC §1807.3.3 post backfill and hole size",
    FOOTING_DEPTH_SECTIONS,
    "AISC 360-16 §F8 round HSS flexure, Ω = 1.67",
  ];
  return { asce: `ASCE 7-${e.slice(2)}`, ibc: "IBC 2018/2021", aisc: "AISC 360-16", sections };
}
