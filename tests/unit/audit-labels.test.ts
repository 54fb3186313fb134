/**
 * The audit log shows actions in words: every action the code records has a label in the one
 * table, and an unknown one is worded from its name, never shown as a code.
 */
import { execFileSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import { AUDIT_ACTION_LABELS, auditActionLabel, auditDetailWords } from "@/components/admin/audit-labels";

function recordedActions(): string[] {
  // Every literal `action: "…"` handed to the audit writer in app/ and db/.
  const out = execFileSync("git", ["grep", "-h", "-o", "-E", "action: [\"`][a-z-]+[\"`]", "--", "app", "db"], { encoding: "utf8" });
  return [...new Set(out.split("\n").filter(Boolean).map((l) => l.replace(/^action: ["`]|["`]$/g, "")))];
}

describe("audit action labels", () => {
  it("has a label in words for every action the code records", () => {
    const actions = recordedActions();
    expect(actions.length).toBeGreaterThan(5);
    const missing = actions.filter((a) => !(a in AUDIT_ACTION_LABELS));
    expect(missing).toEqual([]);
  });

  it("words the decided-revision actions made from the decision", () => {
    // app/_lib/review/workflow.ts records `revision-${decision}` for approve and request changes.
    expect(auditActionLabel("revision-approved")).toBe("Approved a revision");
    expect(auditActionLabel("revision-changes-requested")).toBe("Asked for changes to a revision");
  });

  it("never shows an unknown action as a code", () => {
    expect(auditActionLabel("design-archived")).toBe("Design archived");
  });

  it("names roles in words in a role change", () => {
    expect(auditDetailWords("role-changed", { from: ["designer"], to: ["designer", "engineer"] })).toMatch(/^Designer → Designer, .*engineer/i);
  });
});
