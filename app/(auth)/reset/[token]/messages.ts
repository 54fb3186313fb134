import type { ResetState } from "@/db/queries/password-resets";

export function resetProblem(state: Exclude<ResetState, "valid">): string {
  if (state === "used") return "This reset link has already been used. Links work once: ask for a new one if you still need it.";
  if (state === "expired") return "This reset link has expired (links work for 1 hour). Ask for a new one below.";
  return "This reset link is not valid. Check that you opened the whole link from the e-mail, or ask for a new one.";
}
