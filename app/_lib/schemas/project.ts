import { z } from "zod";
import { designInputSchema, siteSchema } from "@/engine/schema";

/**
 * Schemas for projects, criteria cards, designs, revisions and table queries: one per input,
 * shared by the forms, the server actions and the route handlers. Messages name the field and
 * what is allowed.
 */
export const US_STATES = [
  "AL", "AK", "AZ", "AR", "CA", "CO", "CT", "DE", "DC", "FL", "GA", "HI", "ID", "IL", "IN", "IA", "KS", "KY", "LA", "ME", "MD",
  "MA", "MI", "MN", "MS", "MO", "MT", "NE", "NV", "NH", "NJ", "NM", "NY", "NC", "ND", "OH", "OK", "OR", "PA", "RI", "SC", "SD",
  "TN", "TX", "UT", "VT", "VA", "WA", "WV", "WI", "WY",
] as const;

const stateField = z.preprocess(
  (v) => (typeof v === "string" ? v.trim().toUpperCase() : v),
  z.enum(US_STATES, { error: "State must be a two-letter US state code, e.g. CO" }),
);

/** Blank form fields mean "not given"; numbers may arrive as text from a form. */
const optionalNumber = (label: string, min: number, max: number, unit: string) =>
  z.preprocess(
    (v) => (v === "" || v === undefined ? null : typeof v === "string" ? Number(v) : v),
    z.number({ error: `${label} must be a number between ${min} and ${max} ${unit}, or left blank` })
      .min(min, { error: `${label} must be between ${min} and ${max} ${unit}` })
      .max(max, { error: `${label} must be between ${min} and ${max} ${unit}` })
      .nullable(),
  );

const optionalId = z.preprocess((v) => (v === "" || v === undefined ? null : v), z.uuid({ error: "Criteria card must be one of your organisation's cards" }).nullable());

export const projectSchema = z.object({
  name: z.string({ error: "Project name is required" }).trim().min(1, { error: "Project name is required (1–120 characters)" }).max(120, { error: "Project name must be at most 120 characters" }),
  address: z.string().trim().max(300, { error: "Address must be at most 300 characters" }).default(""),
  state: stateField,
  latitude: optionalNumber("Latitude", -90, 90, "degrees").default(null),
  longitude: optionalNumber("Longitude", -180, 180, "degrees").default(null),
  notes: z.string().max(4000, { error: "Notes must be at most 4000 characters" }).default(""),
  criteriaCardId: optionalId.default(null),
});
export type ProjectInput = z.output<typeof projectSchema>;

/** PATCH: any subset of the project's fields (nothing defaulted, so absent fields stay as they are). */
export const projectPatchSchema = z.strictObject({
  name: projectSchema.shape.name.optional(),
  address: z.string().trim().max(300, { error: "Address must be at most 300 characters" }).optional(),
  state: stateField.optional(),
  latitude: optionalNumber("Latitude", -90, 90, "degrees").optional(),
  longitude: optionalNumber("Longitude", -180, 180, "degrees").optional(),
  notes: z.string().max(4000, { error: "Notes must be at most 4000 characters" }).optional(),
  criteriaCardId: optionalId.optional(),
}, { error: (iss) => (iss.code === "unrecognized_keys" ? "Only name, address, state, latitude, longitude, notes and criteriaCardId can be changed" : undefined) });

export const CRITERIA_KEYS = ["buildingCode", "asceEdition", "riskCategory", "windSpeedMph", "exposure", "groundSnowPsf", "frostDepthIn", "soilClass"] as const;
export type CriteriaKey = (typeof CRITERIA_KEYS)[number];

const numberFromText = <T extends z.ZodType>(schema: T) => z.preprocess((v) => (typeof v === "string" && v.trim() !== "" ? Number(v) : v === "" ? undefined : v), schema);

export const criteriaValuesSchema = z.object({
  buildingCode: z.string({ error: "Building code is required, e.g. IBC 2021" }).trim().min(3, { error: "Building code is required, e.g. IBC 2021 (3–60 characters)" }).max(60, { error: "Building code must be at most 60 characters" }),
  asceEdition: siteSchema.shape.edition,
  riskCategory: z.enum(["I", "II", "III", "IV"], { error: "Risk category must be one of I, II, III, IV" }),
  windSpeedMph: numberFromText(siteSchema.shape.windSpeedMph),
  exposure: siteSchema.shape.exposure,
  groundSnowPsf: numberFromText(z.number({ error: "Ground snow load must be between 0 and 300 psf" }).min(0, { error: "Ground snow load must be between 0 and 300 psf" }).max(300, { error: "Ground snow load must be between 0 and 300 psf" })),
  frostDepthIn: numberFromText(siteSchema.shape.frostDepthIn),
  soilClass: numberFromText(z.union([z.literal(1), z.literal(2), z.literal(3), z.literal(4), z.literal(5)], { error: "Presumed soil class must be 1, 2, 3, 4 or 5 (IBC Table 1806.2)" })),
});

const sourceSchema = z.object({
  source: z.string({ error: "Source is required" }).trim().min(3, { error: "Say where this value comes from (3–200 characters)" }).max(200, { error: "Source must be at most 200 characters" }),
  checkedOn: z.iso.date({ error: "Date checked must be a date (YYYY-MM-DD)" }),
});

export const criteriaCardSchema = z.object({
  jurisdiction: z.string({ error: "Jurisdiction is required" }).trim().min(2, { error: "Jurisdiction is required, e.g. the county name (2–120 characters)" }).max(120, { error: "Jurisdiction must be at most 120 characters" }),
  state: stateField,
  values: criteriaValuesSchema,
  sources: z.object(Object.fromEntries(CRITERIA_KEYS.map((k) => [k, sourceSchema])) as Record<CriteriaKey, typeof sourceSchema>),
});
export type CriteriaCardInput = z.output<typeof criteriaCardSchema>;

export const designCreateSchema = z.object({
  name: z.string({ error: "Design name is required" }).trim().min(1, { error: "Design name is required (1–120 characters)" }).max(120, { error: "Design name must be at most 120 characters" }),
  /** Optional starting input; without it the design starts from the defaults and the project's criteria card. */
  input: designInputSchema.optional(),
  note: z.string().trim().max(500, { error: "Note must be at most 500 characters" }).default(""),
});

export const revisionCreateSchema = z.object({
  baseRevisionId: z.uuid({ error: "baseRevisionId must be the id of the revision you started from" }),
  input: designInputSchema,
  note: z.string().trim().max(500, { error: "Note must be at most 500 characters" }).default(""),
});

/** Table paging from query parameters (all optional). */
export const listQuerySchema = z.object({
  // eslint-disable-next-line no-control-regex
  q: z.string().max(200, { error: "Filter must be at most 200 characters" }).regex(/^[^\u0000-\u001f\u007f]*$/, { error: "Filter must not contain control characters" }).optional(),
  sort: z.string().max(40).optional(),
  dir: z.enum(["asc", "desc"], { error: "dir must be asc or desc" }).optional(),
  page: z.coerce.number({ error: "page must be a whole number from 1" }).int({ error: "page must be a whole number from 1" }).min(1, { error: "page must be a whole number from 1" }).optional(),
  pageSize: z.coerce.number({ error: "pageSize must be a whole number between 1 and 100" }).int().min(1, { error: "pageSize must be a whole number between 1 and 100" }).max(100, { error: "pageSize must be a whole number between 1 and 100" }).optional(),
});

/** Reads a table's query from URL search params; `prefix` lets two tables share one page URL. */
export function listQueryFrom(params: URLSearchParams | Record<string, string | string[] | undefined>, prefix = "") {
  const get = (k: string) => {
    const v = params instanceof URLSearchParams ? params.get(prefix + k) : params[prefix + k];
    return (Array.isArray(v) ? v[0] : v) ?? undefined;
  };
  return listQuerySchema.parse({ q: get("q") || undefined, sort: get("sort") || undefined, dir: get("dir") || undefined, page: get("page") || undefined, pageSize: get("pageSize") || undefined });
}

/** For pages: a malformed query falls back to the defaults instead of an error page. */
export function listQueryLenient(params: Record<string, string | string[] | undefined>, prefix = "") {
  try {
    return listQueryFrom(params, prefix);
  } catch {
    return {};
  }
}
