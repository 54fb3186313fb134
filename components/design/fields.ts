/**
 * The field-label table lives in the engine (engine/field-labels.ts) so the schema's messages, the
 * pages and the report read one table; re-exported here under the names the editor uses.
 */
import { FIELD_LABELS, fieldLabel, type FieldLabel } from "@/engine/field-labels";

export type FieldMeta = FieldLabel;
export const FIELD_META = FIELD_LABELS;
export { fieldLabel };
