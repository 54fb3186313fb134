/**
 * A fast path for validating a design input that is already valid — the common case for the API
 * and the form, where zod's general machinery was about a quarter of a whole `sizeDesign`.
 *
 * It is compiled at load time FROM `designInputSchema` itself (ranges, whole-number rules, option
 * lists, defaults, optional keys and key order all read from the schema), so the schema stays the
 * one source of truth. Its only answers are "here is exactly what zod would return" or "don't
 * know" (`undefined`): anything invalid, unusual (non-plain objects) or outside the small set of
 * schema kinds it understands goes to zod, which then produces the result or the field messages.
 * A schema part it cannot compile (say a new kind of rule added later) switches it off entirely
 * (`fastParseStatus().enabled` false), so it can make validation slower but never different.
 * Refinements (`superRefine`) and sub-schemas it does not model (the soil-class preprocess) are run
 * through zod itself. tests/engine/fast-parse.test.ts compares it with zod on random inputs.
 */
import { config as zodConfig, type z } from "zod";
import { designInputSchema, type DesignInput } from "./schema";

const FAIL = Symbol("fail");
type Parser = (v: unknown) => unknown;
/** How an object key treats absence: required, optional (absent stays absent) or defaulted. */
interface Field { key: string; parse: Parser; mode: "required" | "optional" | "default"; dflt?: () => unknown }

class Unsupported extends Error {}

/* eslint-disable @typescript-eslint/no-explicit-any -- zod's internal definitions are untyped here */
type Internal = { _zod: { def: any; check?: (payload: { value: unknown; issues: unknown[] }) => unknown } };

function isPlainObject(v: unknown): v is Record<string, unknown> {
  if (typeof v !== "object" || v === null) return false;
  const proto = Object.getPrototypeOf(v);
  return proto === Object.prototype || proto === null;
}

/** Run a schema's own checks (refinements) on an already-built value; true when none complains. */
function checksPass(checks: Internal[], value: unknown): boolean {
  if (checks.length === 0) return true;
  const payload = { value, issues: [] as unknown[] };
  for (const ch of checks) {
    // As zod runs them on a value with no issues so far: a check with a `when` runs if it says so.
    const when = ch._zod.def.when as ((p: unknown) => boolean) | undefined;
    if (when && !when(payload)) continue;
    const r = ch._zod.check!(payload);
    if (r instanceof Promise) return false;
  }
  return payload.issues.length === 0;
}

function compileNumber(def: any): Parser {
  const tests: ((v: number) => boolean)[] = [];
  for (const c of (def.checks ?? []) as Internal[]) {
    const cd = c._zod.def;
    if (cd.when) throw new Unsupported("conditional check");
    if (cd.check === "greater_than" && typeof cd.value === "number") tests.push(cd.inclusive ? (v) => v >= cd.value : (v) => v > cd.value);
    else if (cd.check === "less_than" && typeof cd.value === "number") tests.push(cd.inclusive ? (v) => v <= cd.value : (v) => v < cd.value);
    else if (cd.check === "number_format" && cd.format === "safeint") tests.push((v) => Number.isSafeInteger(v));
    else throw new Unsupported(`number check ${cd.check}`);
  }
  return (v) => {
    if (typeof v !== "number" || !Number.isFinite(v)) return FAIL;
    for (let i = 0; i < tests.length; i++) if (!tests[i](v)) return FAIL;
    return v;
  };
}

function compileString(def: any): Parser {
  let max = Infinity;
  for (const c of (def.checks ?? []) as Internal[]) {
    const cd = c._zod.def;
    // Length checks carry zod's "only when the value has a length" guard: always true here.
    if (cd.check !== "max_length" || typeof cd.maximum !== "number") throw new Unsupported(`string check ${cd.check}`);
    max = Math.min(max, cd.maximum);
  }
  return (v) => (typeof v === "string" && v.length <= max ? v : FAIL);
}

function compileArray(def: any): Parser {
  const el = compile(def.element);
  let min = 0, max = Infinity;
  for (const c of (def.checks ?? []) as Internal[]) {
    const cd = c._zod.def;
    if (cd.check === "min_length") min = Math.max(min, cd.minimum);
    else if (cd.check === "max_length") max = Math.min(max, cd.maximum);
    else throw new Unsupported(`array check ${cd.check}`);
  }
  return (v) => {
    if (!Array.isArray(v) || v.length < min || v.length > max) return FAIL;
    const out = new Array(v.length);
    for (let i = 0; i < v.length; i++) {
      if (!(i in v)) return FAIL;
      const r = el(v[i]);
      if (r === FAIL) return FAIL;
      out[i] = r;
    }
    return out;
  };
}

function field(key: string, schema: Internal): Field {
  const def = schema._zod.def;
  if ((def.type === "optional" || def.type === "default") && def.checks?.length) throw new Unsupported("checks on a wrapper");
  if (def.type === "optional") return { key, parse: compile(def.innerType), mode: "optional" };
  if (def.type === "default") {
    const sample = def.defaultValue;
    if (typeof sample === "function") throw new Unsupported("default from a function");
    // A fresh copy per parse, as zod hands out, so no two parsed inputs share an array or object.
    const dflt = Array.isArray(sample) ? () => (def.defaultValue as unknown[]).slice()
      : isPlainObject(sample) ? () => ({ ...(def.defaultValue as object) })
      : typeof sample === "object" && sample !== null ? null
      : () => sample;
    if (!dflt) throw new Unsupported("default object kind");
    if (Array.isArray(sample) && sample.some((x) => typeof x === "object" && x !== null)) throw new Unsupported("nested default");
    if (isPlainObject(sample) && Object.values(sample).some((x) => typeof x === "object" && x !== null)) throw new Unsupported("nested default");
    return { key, parse: compile(def.innerType), mode: "default", dflt };
  }
  return { key, parse: compile(schema), mode: "required" };
}

/**
 * Whether to build functions from source: only where zod itself would (its `jitless` setting is
 * honoured, so an app that sets it for a strict CSP gets no eval probe from here either) and the
 * runtime allows it. Asked once, on the first parse.
 */
function canGenerate(): boolean {
  if (zodConfig().jitless) return false;
  if (typeof navigator !== "undefined" && navigator?.userAgent?.includes("Cloudflare")) return false;
  try {
    return new Function("return 1")() === 1;
  } catch {
    return false;
  }
}

/** Set while compiling: generate code or use the generic loop. */
let generating = false;

function compileObject(def: any, checks: Internal[]): Parser {
  if (def.catchall !== undefined) throw new Unsupported("catchall");
  const fields = Object.entries(def.shape as Record<string, Internal>).map(([k, s]) => field(k, s));
  if (fields.some((f) => f.key === "__proto__" || f.key === "constructor")) throw new Unsupported("special key");
  const pass = (o: unknown) => checksPass(checks, o);
  if (generating) {
    // Straight-line code per object with the keys written in (what zod's own JIT does): loads and
    // stores with constant keys are several times faster than a loop over a key list.
    const src: string[] = ["return function (v) {", "if (!isPlain(v)) return FAIL;", "var o = {}, r, x;"];
    fields.forEach((f, i) => {
      const k = JSON.stringify(f.key);
      src.push(`x = v[${k}];`);
      const parse = `r = P[${i}](x); if (r === FAIL) return FAIL; o[${k}] = r;`;
      if (f.mode === "default") src.push(`if (x === undefined) o[${k}] = D[${i}](); else { ${parse} }`);
      else if (f.mode === "optional") src.push(`if (x === undefined) { if (${k} in v) o[${k}] = undefined; } else { ${parse} }`);
      else src.push(`if (x === undefined && !(${k} in v)) return FAIL; ${parse}`);
    });
    src.push("return pass(o) ? o : FAIL;", "};");
    return new Function("P", "D", "FAIL", "isPlain", "pass", src.join("\n"))(
      fields.map((f) => f.parse), fields.map((f) => f.dflt), FAIL, isPlainObject, pass,
    ) as Parser;
  }
  return (v) => {
    if (!isPlainObject(v)) return FAIL;
    const out: Record<string, unknown> = {};
    for (let i = 0; i < fields.length; i++) {
      const f = fields[i];
      const raw = v[f.key];
      if (raw === undefined) {
        if (f.mode === "default") { out[f.key] = f.dflt!(); continue; }
        if (f.mode === "optional") { if (f.key in v) out[f.key] = undefined; continue; }
        if (!(f.key in v)) return FAIL;
      }
      const r = f.parse(raw);
      if (r === FAIL) return FAIL;
      out[f.key] = r;
    }
    return pass(out) ? out : FAIL;
  };
}

function compileUnion(def: any): Parser {
  const options = (def.options as Internal[]).map((o) => ({ schema: o, parse: compile(o) }));
  if (typeof def.discriminator === "string") {
    const disc = def.discriminator as string;
    const byValue = new Map<unknown, Parser>();
    for (const o of options) {
      const d = o.schema._zod.def;
      const lit = d.type === "object" ? d.shape[disc]?._zod.def : undefined;
      if (!lit || lit.type !== "literal") throw new Unsupported("discriminator is not a literal");
      for (const value of lit.values as unknown[]) {
        if (byValue.has(value)) throw new Unsupported("repeated discriminator");
        byValue.set(value, o.parse);
      }
    }
    return (v) => {
      if (!isPlainObject(v)) return FAIL;
      const p = byValue.get(v[disc]);
      return p ? p(v) : FAIL;
    };
  }
  // Plain union: zod returns the first option that succeeds. Only options of different kinds
  // (e.g. a number or the literal "auto") are allowed, so "first that passes here" cannot pick
  // a different option than zod does.
  const kinds = options.map((o) => o.schema._zod.def.type);
  if (new Set(kinds).size !== kinds.length || kinds.some((k) => !["number", "literal", "string", "boolean", "enum"].includes(k)) || (kinds.includes("string") && (kinds.includes("literal") || kinds.includes("enum")))) {
    throw new Unsupported("overlapping union");
  }
  return (v) => {
    for (let i = 0; i < options.length; i++) {
      const r = options[i].parse(v);
      if (r !== FAIL) return r;
    }
    return FAIL;
  };
}

function compile(schema: Internal): Parser {
  const def = schema._zod.def;
  const checks = (def.checks ?? []) as Internal[];
  switch (def.type) {
    case "number":
      return compileNumber(def);
    case "string":
      return compileString(def);
    case "boolean":
      if (checks.length) throw new Unsupported("boolean checks");
      return (v) => (typeof v === "boolean" ? v : FAIL);
    case "enum": {
      if (checks.length) throw new Unsupported("enum checks");
      const values = new Set(Object.values(def.entries as Record<string, unknown>));
      return (v) => (values.has(v) ? v : FAIL);
    }
    case "literal": {
      if (checks.length) throw new Unsupported("literal checks");
      const values = new Set(def.values as unknown[]);
      return (v) => (values.has(v) ? v : FAIL);
    }
    case "array":
      return compileArray(def);
    case "object":
      return compileObject(def, checks);
    case "union":
      if (checks.length) throw new Unsupported("union checks");
      return compileUnion(def);
    default: {
      // Anything else (the soil-class preprocess, say) is parsed by zod itself: still exact.
      const zs = schema as unknown as z.ZodType;
      return (v) => {
        const r = zs.safeParse(v);
        return r.success ? r.data : FAIL;
      };
    }
  }
}
/* eslint-enable @typescript-eslint/no-explicit-any */

/**
 * Compile the fast parser for `designInputSchema`; `parse` is null when the schema holds something
 * it does not model. `generate: false` builds the generic version used where code generation is
 * not allowed (exported so the tests can check both).
 */
export function compileFastParser(generate = canGenerate()): { parse: ((raw: unknown) => DesignInput | undefined) | null; offReason: string } {
  generating = generate;
  try {
    const p = compile(designInputSchema as unknown as Internal);
    return { parse: (raw) => { const r = p(raw); return r === FAIL ? undefined : (r as DesignInput); }, offReason: "" };
  } catch (e) {
    if (!(e instanceof Unsupported)) throw e;
    return { parse: null, offReason: e.message };
  } finally {
    generating = false;
  }
}

let compiled: ReturnType<typeof compileFastParser> | undefined;

/** Whether the fast path is on, and why not ("" when on); compiles it on first use. */
export function fastParseStatus(): { enabled: boolean; offReason: string } {
  compiled ??= compileFastParser();
  return { enabled: compiled.parse !== null, offReason: compiled.offReason };
}

/**
 * The parsed input exactly as `designInputSchema.parse(raw)` would return it, or `undefined` when
 * the fast path cannot vouch for that (invalid or unusual input): then ask zod.
 */
export function fastParseDesignInput(raw: unknown): DesignInput | undefined {
  compiled ??= compileFastParser();
  return compiled.parse ? compiled.parse(raw) : undefined;
}
