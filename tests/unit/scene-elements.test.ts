/**
 * The 3D scene's React Three Fiber root knows only the three.js classes registered in
 * SCENE_ELEMENTS (components/preview/scene-content.tsx), not the whole of three as `<Canvas>`
 * would register. An element missing from the list fails only when the scene mounts in a browser
 * ("is not part of the THREE namespace"), so this reads the JSX of every file rendered inside the
 * root and holds the list to it: each lower-case element is registered, and each registered class
 * is used. `primitive` (an object made outside React) needs no registration.
 */
import fs from "node:fs";
import path from "node:path";
import * as THREE from "three";
import ts from "typescript";
import { describe, expect, it } from "vitest";
import { SCENE_ELEMENTS } from "@/components/preview/scene-content";

const dir = path.join(process.cwd(), "components/preview");

/** Files of the scene's root: they import React Three Fiber. scene.tsx hosts the root (its JSX is page HTML). */
const rootFiles = fs.readdirSync(dir)
  .filter((f) => f.endsWith(".tsx") && f !== "scene.tsx")
  .filter((f) => fs.readFileSync(path.join(dir, f), "utf8").includes('from "@react-three/fiber"'));

function intrinsicElements(file: string): Set<string> {
  const source = ts.createSourceFile(file, fs.readFileSync(path.join(dir, file), "utf8"), ts.ScriptTarget.Latest, true, ts.ScriptKind.TSX);
  const names = new Set<string>();
  const visit = (node: ts.Node) => {
    if ((ts.isJsxOpeningElement(node) || ts.isJsxSelfClosingElement(node)) && ts.isIdentifier(node.tagName) && /^[a-z]/.test(node.tagName.text)) names.add(node.tagName.text);
    ts.forEachChild(node, visit);
  };
  visit(source);
  return names;
}

describe("three.js classes registered for the scene's root", () => {
  it("finds the files rendered in the root", () => {
    expect(rootFiles).toEqual(expect.arrayContaining(["scene-content.tsx", "camera-rig.tsx", "scene-draw.tsx"]));
  });

  it("registers every element the root's JSX uses, and nothing it does not use", () => {
    const used = new Set<string>();
    for (const f of rootFiles) for (const n of intrinsicElements(f)) used.add(n);
    used.delete("primitive");
    const pascal = [...used].map((n) => n[0].toUpperCase() + n.slice(1)).sort();
    expect(Object.keys(SCENE_ELEMENTS).sort()).toEqual(pascal);
    // Each under its own name, so `<hemisphereLight>` makes a HemisphereLight.
    for (const [name, ctor] of Object.entries(SCENE_ELEMENTS)) expect((THREE as unknown as Record<string, unknown>)[name], name).toBe(ctor);
  });

  it("does not register the whole of three (the scene's chunk then carries every class)", () => {
    expect(Object.keys(SCENE_ELEMENTS).length).toBeLessThan(10);
    for (const f of rootFiles.concat("scene.tsx")) expect(fs.readFileSync(path.join(dir, f), "utf8"), f).not.toMatch(/\bCanvas\b.*from "@react-three\/fiber"|import \* as THREE/);
  });
});
