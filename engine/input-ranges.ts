/**
 * The allowed range of each numeric design input, read from the one schema (engine/schema.ts), so
 * a calculation function that guards a design input says exactly what the form and the API say.
 * A function that is a general method for any value (e.g. Cs up to 90° tilt, concrete for any
 * hole) keeps its own wider guard; tests/engine/input-ranges.test.ts checks both kinds.
 */
import type { z } from "zod";
import { EngineInputError } from "./errors";
import { messageName } from "./field-labels";
import { designInputSchema } from "./schema";

export interface InputRange {
  min: number;
  max: number;
  int: boolean;
}

type Node = z.ZodType & { _zod: { def: Record<string, unknown> & { type: string } } };

/** Steps through defaults, optionals, preprocessing and refinements to the schema that holds the checks. */
function unwrap(node: Node): Node {
  let current = node;
  for (;;) {
    const def = current._zod.def;
    if (def.innerType) current = def.innerType as Node;
    else if (def.type === "pipe") current = def.out as Node;
    else return current;
  }
}

/** The numeric ranges under a schema node, keyed by dotted path (a list's element shares the list's path). */
function collect(node: Node, path: string, into: Map<string, InputRange>): void {
  const inner = unwrap(node);
  const def = inner._zod.def;
  if (def.type === "object") {
    for (const [key, child] of Object.entries((inner as unknown as z.ZodObject).shape)) collect(child as Node, path ? `${path}.${key}` : key, into);
  } else if (def.type === "union") {
    for (const option of def.options as Node[]) collect(option, path, into);
  } else if (def.type === "array") {
    collect(def.element as Node, path, into);
  } else if (def.type === "number") {
    const n = inner as unknown as z.ZodNumber;
    into.set(path, { min: n.minValue ?? -Infinity, max: n.maxValue ?? Infinity, int: n.isInt });
  }
}

let ranges: Map<string, InputRange> | undefined;

/** Every numeric input path and its range, as the schema states it (read on first use, once). */
export function inputRanges(): ReadonlyMap<string, InputRange> {
  if (!ranges) {
    ranges = new Map();
    collect(designInputSchema as unknown as Node, "", ranges);
  }
  return ranges;
}

export function inputRange(path: string): InputRange {
  const range = inputRanges().get(path);
  if (!range) throw new Error(`${path} is not a numeric design input`);
  return range;
}

/**
 * Throw unless `value` is within the schema's range for the design input `path`, with the message
 * the schema gives ("Concrete unit weight must be between 100 and 160 pcf").
 */
export function requireInput(path: string, value: unknown, unit = ""): asserts value is number {
  const { min, max } = inputRange(path);
  if (typeof value !== "number" || !Number.isFinite(value) || value < min || value > max) {
    throw new EngineInputError(path, `${messageName(path)} must be between ${min} and ${max}${unit ? " " + unit : ""}`);
  }
}
