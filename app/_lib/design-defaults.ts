// A new design's starting input lives in db/design-defaults.ts so the seeds (which import nothing from app/) share it.
export { applyCriteriaCard, startingInput } from "@/db/design-defaults";
