/**
 * The one table of design input names: the label a person reads beside the field (editor, review
 * page, revision diff, report), its unit, help text, and the name validation messages start with
 * when that differs from the label (the API's wording is a contract: "Wind speed must be between 85
 * and 200 mph"). Keys are the dotted paths of designInputSchema, so an error lands beside its field.
 * Pure data: the engine's schema, the pages and the PDF all read it.
 */

import { imperialText, qty, says, type QuantityText } from "./quantity-text";

/** Display unit kinds a field is shown in (components/design/units.ts converts each). */
export type FieldUnit = "in" | "ft" | "mph" | "psf" | "psfPerFt" | "pcf" | "ksi" | "psi" | "lbMass" | "deg" | "pct";

export interface FieldLabel {
  label: string;
  /** The name validation messages use, when it is not `label`. */
  message?: string;
  unit?: FieldUnit;
  help: string;
  /** The help with its numbers as quantities, when it has any (the editor words it in the reader's units). */
  helpText?: QuantityText;
}

/** Help that carries quantities: both its customary words and its structured form. */
function help(text: QuantityText): { help: string; helpText: QuantityText } {
  return { help: imperialText(text), helpText: text };
}

export const FIELD_LABELS: Record<string, FieldLabel> = {
  "site.edition": { label: "ASCE 7 edition", help: "The edition of ASCE 7 your building code adopts (see the criteria card)." },
  "site.riskCategory": { label: "Risk category", help: "II for an ordinary array; the category sets which wind map applies." },
  "site.windSpeedMph": { label: "Basic wind speed", message: "Wind speed", unit: "mph", ...help(says`Ultimate design wind speed V for the site from the ASCE 7 map or the county: a 3-second gust at ${qty(33, "ft")} above open country.`) },
  "site.exposure": { label: "Exposure category", help: "B: suburbs or woods close by. C: open fields, scattered trees. D: flat ground facing open water or salt flats." },
  "site.groundElevationFt": { label: "Ground elevation", unit: "ft", help: "Height above sea level. Thinner air at altitude lowers the wind pressure (Ke)." },
  "site.topography.method": { label: "Topography", message: "Topography method", help: "Flat unless the array sits on or near the top of a hill, ridge or escarpment that speeds the wind up." },
  "site.topography.kzt": { label: "Topographic factor Kzt", help: "Speed-up factor from the engineer or ASCE 7 §26.8 (1.0 is flat ground)." },
  "site.topography.k1": { label: "K1", message: "Topographic multiplier K1", help: "Hill shape multiplier from ASCE 7 Fig. 26.8-1." },
  "site.topography.k2": { label: "K2", message: "Topographic multiplier K2", help: "Reduction with distance from the crest." },
  "site.topography.k3": { label: "K3", message: "Topographic multiplier K3", help: "Reduction with height above local ground." },
  "site.groundSnowPsf": { label: "Ground snow load", unit: "psf", help: "pg from the snow map or the county: the weight of snow on the ground the panels must carry." },
  "site.snowExposureCe": { label: "Snow exposure factor Ce", help: "1.0 for partially exposed; lower where wind scours snow off, higher in sheltered spots." },
  "site.snowThermalCt": { label: "Snow thermal factor Ct", help: "1.2 for unheated structures such as an open array." },
  "site.soil.method": { label: "Soil values from", message: "Soil method", help: "Presumed class from IBC Table 1806.2, or the values in a geotechnical report." },
  "site.soil.soilClass": { label: "Presumed soil class", message: "Soil class", help: "1 crystalline rock … 4 sand, gravel · 5 clay, silt. Fill, organic soil and mud need a soil report." },
  "site.soil.allowableBearingPsf": { label: "Allowable bearing", message: "Allowable bearing pressure", unit: "psf", help: "Vertical bearing pressure the soil report allows under the footing." },
  "site.soil.lateralBearingPsfPerFt": { label: "Lateral bearing", message: "Lateral bearing pressure", unit: "psfPerFt", help: "Sideways soil resistance, growing with depth, from the soil report." },
  "site.soil.description": { label: "Soil description", help: "What the report calls the soil, e.g. 'stiff sandy clay'." },
  "site.frostDepthIn": { label: "Frost depth", unit: "in", help: "How deep the ground freezes. Footings go below it so frost heave cannot jack them up." },
  "site.slopeAlongPct": { label: "Ground slope along the array", unit: "pct", help: "Rise of the ground going right along the rows, as a percentage of the run (negative falls)." },
  "site.slopeAcrossPct": { label: "Ground slope front to back", message: "Ground slope across the array", unit: "pct", help: "Rise of the ground from the low (front) edge toward the back (negative falls to the back)." },
  "site.waterTableDepthFt": { label: "Water table depth", unit: "ft", help: "Leave blank if groundwater is well below the footing. Below it, concrete weighs less against uplift." },
  "array.moduleLengthIn": { label: "Module length", unit: "in", help: "Long side of one module, from the datasheet." },
  "array.moduleWidthIn": { label: "Module width", unit: "in", help: "Short side of one module." },
  "array.moduleWeightLb": { label: "Module weight", unit: "lbMass", help: "Weight of one module from the datasheet." },
  "array.orientation": { label: "Orientation", help: "Portrait: long side up the slope. Landscape: long side along the row." },
  "array.rows": { label: "Rows", help: "Modules stacked up the slope of the rack." },
  "array.columns": { label: "Columns", help: "Modules side by side along the rack." },
  "array.gapIn": { label: "Gap between modules", unit: "in", help: "Clamp gap between neighbouring modules." },
  "array.tiltDeg": { label: "Tilt", unit: "deg", help: "Angle of the panels from horizontal." },
  "array.tiltSettingsDeg": { label: "Allowed tilt settings", message: "Tilt settings", unit: "deg", help: "For an adjustable rack: every tilt it may be set to, comma separated. The footing is sized for the worst." },
  "array.lowestEdgeClearanceIn": { label: "Lowest edge clearance", unit: "in", ...help(says`Gap between the bottom edge of the panels and the ground; ${qty(18, "in")} to ${qty(24, "in")} keeps snow and weeds off.`) },
  "array.rackingDeadPsf": { label: "Racking weight", message: "Racking dead load", unit: "psf", help: "Rails, purlins and clamps spread over the panel area." },
  "array.rackDepthIn": { label: "Rack depth", message: "Rack depth (panel underside to post top)", unit: "in", help: "From the panel underside down to the top of the post." },
  "array.flow": { label: "Wind under the array", message: "Wind flow beneath the array", help: "Clear unless stored material or a wall blocks more than half the space under the panels." },
  "array.slipperySurface": { label: "Snow slides off", message: "Slippery surface", help: "Glass modules without snow guards let snow slide, which lowers the design snow." },
  "array.azimuthDeg": { label: "Array azimuth", unit: "deg", help: "Direction the module faces, clockwise from true north: 180 = south. Used for the drawing and the field spec, not the wind calculation." },
  "posts.count": { label: "Number of posts", help: "Posts in the single row under the beam." },
  "posts.spacingFt": { label: "Post spacing", unit: "ft", help: "Centre to centre. Leave blank to spread the posts evenly under the array." },
  "posts.pipeSize": { label: "Pipe size", help: "Nominal size of standard-weight (Schedule 40) steel pipe used for the posts." },
  "posts.yieldKsi": { label: "Post yield strength", unit: "ksi", ...help(says`Fy of the pipe steel; ${qty(35, "ksi")} for common ASTM A53 Grade B pipe.`) },
  "posts.holeDiameterIn": { label: "Hole diameter", unit: "in", help: "The auger size. Choose “size it for me” to try the candidate sizes and pick the shallowest reasonable hole." },
  "posts.autoDiametersIn": { label: "Candidate hole sizes", unit: "in", help: "Auger sizes the crew has, tried by “size it for me”." },
  "posts.maxAutoDepthIn": { label: "Deepest reasonable hole", message: "Largest reasonable depth for automatic sizing", unit: "in", help: "“Size it for me” prefers holes no deeper than this." },
  "posts.sweepDiametersIn": { label: "Options table sizes", unit: "in", help: "Hole sizes listed in the diameter options table." },
  "posts.fixedDepthIn": { label: "Given footing depth", unit: "in", help: "Leave blank to size the depth. Give a depth to check a hole that is already dug." },
  "posts.constrainedAtGrade": { label: "Constrained at grade", help: "Only when a slab or rigid collar at the ground stops the post moving sideways." },
  "posts.isolatedPoleIncrease": { label: "Isolated pole increase", message: "Isolated pole lateral increase (IBC §1806.3.4)", ...help(says`IBC §1806.3.4 doubles lateral bearing for isolated poles that tolerate ${qty(0.5, "in")} movement. Engineer's call.`) },
  "posts.concreteUnitWeightPcf": { label: "Concrete unit weight", unit: "pcf", ...help(says`${qty(145, "pcf")} for normal-weight concrete.`) },
  "posts.wasteAllowancePct": { label: "Concrete waste allowance", unit: "pct", help: "Extra concrete for ragged holes and spillage; 5–10 % is usual." },
  "posts.subtractPostDisplacement": { label: "Subtract post volume", message: "Subtract post displacement", help: "Take the steel's volume out of the concrete order." },
  "posts.depthIncrementIn": { label: "Round depth up to", message: "Depth increment", unit: "in", help: "Depths are rounded up to this step so the crew marks whole numbers." },
  "posts.bearingPressure": { label: "Bearing check on", message: "Bearing pressure basis", help: "Gross (default, conservative): pier weight counted, no credit for the soil dug out. Net: the engineer's option, crediting the weight of the soil removed; use only with a net allowable value." },
  "posts.soilUnitWeightPcf": { label: "Soil unit weight (net bearing)", message: "Soil unit weight", unit: "pcf", ...help(says`Weight of the soil the pier replaces, credited only when bearing is checked on net pressure; ${qty(100, "pcf")} to ${qty(120, "pcf")} is usual.`) },
  "posts.concreteStrengthPsi": { label: "Concrete strength f'c at 28 days", message: "Concrete strength", unit: "psi", ...help(says`Specified compressive strength for the footing concrete; ${qty(4000, "psi")} is usual for post footings. Never below the ${qty(2000, "psi")} minimum for post backfill (IBC §1807.3.3).`) },
  "posts.maxAggregateIn": { label: "Largest aggregate", message: "Maximum aggregate size", unit: "in", ...help(says`Largest stone in the mix, as the engineer sets it; ${qty(0.75, "in", 2)} is usual for augered holes.`) },
  "posts.slumpIn": { label: "Slump", unit: "in", ...help(says`Workability the engineer sets; about ${qty(4, "in")} fills an augered hole around a post without honeycombing.`) },
  "posts.sideFrictionPsf": { label: "Side friction", unit: "psf", help: "Engineer's skin friction against uplift. Leave blank to count concrete weight only." },
  projectName: { label: "Project name on print-outs", help: "" },
};


/** The label of an input path ("site.windSpeedMph" → "Basic wind speed"); the path itself when unknown. */
export function fieldLabel(path: string): string {
  return FIELD_LABELS[path]?.label ?? path;
}

/** The name a validation message for this input starts with ("Wind speed must be between …"). */
export function messageName(path: string): string {
  const entry = FIELD_LABELS[path];
  if (!entry) throw new Error(`No field label for ${path}`);
  return entry.message ?? entry.label;
}
