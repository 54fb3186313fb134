/**
 * The crew's checklist on the field spec, one stable key per item: ticks are saved against the key,
 * so rewording an item keeps its saved ticks. Printed as empty boxes to tick by hand.
 */
export const FIELD_CHECKLIST = [
  { key: "utility-locate", label: "Utility locate called and marks on site before digging" },
  { key: "holes-inspected", label: "Every hole inspected (diameter, depth, ground) before the pour" },
  { key: "posts-set", label: "Posts level and plumb, set to the laser cut list" },
  { key: "concrete-cured", label: "Concrete cured before the rack and modules load the posts (follow the mix's cure time)" },
  { key: "fasteners-torqued", label: "All fasteners tightened to the racking maker's torque" },
] as const;

export type FieldChecklistKey = (typeof FIELD_CHECKLIST)[number]["key"];

export function isFieldChecklistKey(key: string): key is FieldChecklistKey {
  return FIELD_CHECKLIST.some((item) => item.key === key);
}
