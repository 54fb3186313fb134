/**
 * The layers import only downward: engine ← db ← components ← app (app/_lib for server helpers and
 * services, then routes). A lower layer that reaches up (a component importing a route's action, a
 * seed importing app/ code) ties code that should stand alone to a page, so it fails here.
 */
import fs from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(path.join(ROOT, dir), { withFileTypes: true }).flatMap((entry) => {
    const rel = path.join(dir, entry.name);
    if (entry.isDirectory()) return entry.name === "node_modules" ? [] : sourceFiles(rel);
    return /\.(ts|tsx|mts)$/.test(entry.name) && !entry.name.endsWith(".d.ts") ? [rel] : [];
  });
}

/** Every module a file names: static imports, re-exports, dynamic import() and require(). */
export function specifiers(code: string): string[] {
  const found: string[] = [];
  const patterns = [/\b(?:import|export)\s[^'"`;]*?\bfrom\s*["']([^"']+)["']/g, /\bimport\s*["']([^"']+)["']/g, /\b(?:import|require)\s*\(\s*["']([^"']+)["']\s*\)/g];
  for (const pattern of patterns) for (const match of code.matchAll(pattern)) found.push(match[1]);
  return found;
}

/** Where a specifier points, as a repository path ("app/_lib/auth"), or the package name. */
function target(file: string, spec: string): string {
  if (spec.startsWith("@/")) return spec.slice(2);
  if (spec.startsWith(".")) return path.relative(ROOT, path.resolve(ROOT, path.dirname(file), spec)).split(path.sep).join("/");
  return `package:${spec}`;
}

const RULES: { layer: string; forbidden: RegExp; why: string }[] = [
  { layer: "engine", forbidden: /^(app|components|db)(\/|$)|^package:(react|react-dom|next|knex|pg)(\/|$)/, why: "the engine is pure TypeScript" },
  { layer: "db", forbidden: /^(app|components)(\/|$)/, why: "db sits below components and app (seeds too)" },
  { layer: "components", forbidden: /^app(\/|$)/, why: "components receive route actions as props" },
  { layer: "app/_lib", forbidden: /^app\/(?!_lib(\/|$))/, why: "helpers and services sit below the routes that call them" },
];

describe("layers import only downward", () => {
  for (const rule of RULES) {
    it(`nothing under ${rule.layer}/ imports what it must not (${rule.why})`, () => {
      const files = sourceFiles(rule.layer);
      expect(files.length).toBeGreaterThan(3);
      const upward = files.flatMap((file) =>
        specifiers(fs.readFileSync(path.join(ROOT, file), "utf8"))
          .map((spec) => ({ file, spec, to: target(file, spec) }))
          .filter(({ to }) => rule.forbidden.test(to))
          .map(({ file, spec }) => `${file} → ${spec}`),
      );
      expect(upward).toEqual([]);
    });
  }

  it("every service is server-only", () => {
    const services = sourceFiles("app/_lib/services");
    expect(services.length).toBeGreaterThan(3);
    for (const file of services) expect(specifiers(fs.readFileSync(path.join(ROOT, file), "utf8")), file).toContain("server-only");
  });

  it("the checker sees every import form it is meant to catch", () => {
    const code = `import { a } from "@/app/x";\nimport type { B } from "../app/y";\nexport * from "@/components/z";\nimport "server-only";\nconst c = await import("@/app/w");`;
    expect(specifiers(code)).toEqual(expect.arrayContaining(["@/app/x", "../app/y", "@/components/z", "server-only", "@/app/w"]));
  });
});
