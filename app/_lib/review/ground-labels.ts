import type { GroundFound } from "@/db/queries/as-built";

export const GROUND_FOUND_LABELS: Record<GroundFound, string> = {
  as_expected: "As expected",
  rock: "Rock",
  water: "Water in the hole",
  fill: "Fill or loose soil",
  caving: "Caving sides",
};
