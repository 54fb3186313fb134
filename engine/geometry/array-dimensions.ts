/**
 * Plan and section dimensions of a rectangular fixed-tilt array.
 *
 * Portrait: the module's long side runs up the slope; landscape: across. Rows count up the slope,
 * columns along the width. Gaps are between modules only. [common practice]
 *
 * @example arrayDimensions({ moduleLengthIn: 69, moduleWidthIn: 41, orientation: "portrait",
 *   rows: 2, columns: 6, gapIn: 1 }) // { widthFt: 20.917, slopeLengthFt: 11.583, … }
 */
import { requireOneOf, requireRange } from "../errors";

// The allowed values, built once (these checks run for every tilt of every design).
const ORIENTATIONS = ["portrait", "landscape"] as const;

export type Orientation = "portrait" | "landscape";

export interface ArrayDimensions {
  /** Module side along the slope and along the width (in). */
  moduleAlongSlopeIn: number;
  moduleAlongWidthIn: number;
  widthFt: number;
  slopeLengthFt: number;
  moduleCount: number;
  surfaceAreaFt2: number;
}

/** Across the rows: modules side by side plus the gaps between them. Also what the schema checks post counts against. */
export function arrayWidthFt(a: { orientation: Orientation; moduleLengthIn: number; moduleWidthIn: number; columns: number; gapIn: number }): number {
  const alongWidthIn = a.orientation === "portrait" ? a.moduleWidthIn : a.moduleLengthIn;
  return (a.columns * alongWidthIn + (a.columns - 1) * a.gapIn) / 12;
}

export function arrayDimensions(a: {
  moduleLengthIn: number;
  moduleWidthIn: number;
  orientation: Orientation;
  rows: number;
  columns: number;
  gapIn: number;
}): ArrayDimensions {
  requireRange("array.moduleLengthIn", a.moduleLengthIn, 30, 110, "Module length", "in");
  requireRange("array.moduleWidthIn", a.moduleWidthIn, 15, 60, "Module width", "in");
  requireOneOf("array.orientation", a.orientation, ORIENTATIONS, "Orientation");
  requireRange("array.rows", a.rows, 1, 8, "Rows", "");
  requireRange("array.columns", a.columns, 1, 40, "Columns", "");
  requireRange("array.gapIn", a.gapIn, 0, 12, "Gap between modules", "in");
  const portrait = a.orientation === "portrait";
  const moduleAlongSlopeIn = portrait ? a.moduleLengthIn : a.moduleWidthIn;
  const moduleAlongWidthIn = portrait ? a.moduleWidthIn : a.moduleLengthIn;
  const widthFt = arrayWidthFt(a);
  const slopeLengthFt = (a.rows * moduleAlongSlopeIn + (a.rows - 1) * a.gapIn) / 12;
  return {
    moduleAlongSlopeIn,
    moduleAlongWidthIn,
    widthFt,
    slopeLengthFt,
    moduleCount: a.rows * a.columns,
    surfaceAreaFt2: widthFt * slopeLengthFt,
  };
}
