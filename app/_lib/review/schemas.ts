import { z } from "zod";

/** The body of POST /api/revisions/:id/submit. */
export const submitSchema = z.object({
  engineerId: z.string({ error: "Choose the reviewing engineer" }).uuid({ error: "Choose the reviewing engineer" }),
});

const commentSchema = z.object({
  fieldPath: z
    .string()
    .regex(/^[a-zA-Z][a-zA-Z0-9]*(\.[a-zA-Z0-9]+)*$/, { error: 'fieldPath must be an input path such as "site.windSpeedMph"' })
    .max(120, { error: "fieldPath must be at most 120 characters" })
    .nullish(),
  body: z.string().trim().min(1, { error: "Each comment needs text (1 to 4000 characters)" }).max(4000, { error: "Each comment must be at most 4000 characters" }),
});

/** The engineer's reason for approving a check that fails: one per failing check. */
export const overrideSchema = z.object({
  checkId: z.string({ error: "checkId must name a failing check" }).min(1, { error: "checkId must name a failing check" }).max(40, { error: "checkId must name a failing check" }),
  reason: z.string({ error: "Give the reason (10 to 2,000 characters)" }).trim()
    .min(10, { error: "Give the reason you accept this check (10 to 2,000 characters)" })
    .max(2000, { error: "The reason must be at most 2,000 characters" }),
});

/**
 * The body of POST /api/revisions/:id/review. `comments` may be one text or a list of comments,
 * each optionally pinned to an input field path. Requesting changes needs at least one comment.
 */
export const reviewSchema = z
  .object({
    decision: z.enum(["approve", "request-changes"], { error: 'decision must be "approve" or "request-changes"' }),
    comments: z
      .union([z.string().max(4000, { error: "comments must be at most 4000 characters" }), z.array(commentSchema).max(100, { error: "At most 100 comments per decision" })], {
        error: "comments must be a text or a list of { fieldPath, body }",
      })
      .optional(),
    // Approval is a signature: the engineer's own password, checked (and throttled) like a sign-in.
    password: z.string({ error: "password must be your sign-in password" }).max(200, { error: "password must be your sign-in password" }).optional(),
    overrides: z.array(overrideSchema, { error: "overrides must be a list of { checkId, reason }" }).max(20, { error: "At most 20 overrides" }).optional(),
  })
  .transform((v) => ({
    decision: v.decision,
    password: v.password ?? "",
    overrides: v.overrides ?? [],
    comments: (typeof v.comments === "string" ? (v.comments.trim() ? [{ body: v.comments.trim() }] : []) : (v.comments ?? [])).map((c) => ({
      fieldPath: ("fieldPath" in c ? c.fieldPath : null) ?? null,
      body: c.body,
    })),
  }))
  .superRefine((v, ctx) => {
    if (v.decision === "request-changes" && v.comments.length === 0) {
      ctx.addIssue({ code: "custom", path: ["comments"], message: "Say what to change: requesting changes needs at least one comment" });
    }
  });

export type ReviewBody = z.output<typeof reviewSchema>;
