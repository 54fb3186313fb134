/**
 * The shape of a whole design result. Every length, force and pressure names its unit.
 */
import type { ConcreteOrder } from "./concrete/concrete-order";
import type { ConcreteSpecification } from "./concrete/concrete-spec";
import type { HoleConcrete } from "./concrete/concrete-for-hole";
import type { DepthCheckId, FootingCheck, Governing } from "./footing/checks";
import type { LateralRequirement } from "./footing/evaluate-footing";
import type { PipeMoment } from "./footing/pipe";
import type { SoilValues } from "./footing/soil";
import type { PreviewGeometry } from "./geometry/preview";
import type { SweepRow } from "./options/diameter-sweep";
import type { TiltEnvelopeRow } from "./options/tilt-envelope";
import type { DesignInput } from "./schema";
import type { SnowLoad } from "./snow/snow-load";
import type { DesignWarning } from "./warnings";
import type { ArrayWindForce } from "./wind/array-wind-force";
import type { VelocityPressure } from "./wind/velocity-pressure";

/** One wind case: its coefficients and the resultant forces of `arrayWindForce`. */
export interface WindCaseResult extends ArrayWindForce {
  label: string;
  windDirectionDeg: 0 | 180;
  loadCase: "A" | "B";
  cnWindward: number;
  cnLeeward: number;
}

export interface CombinationRow {
  combination: string;
  shearLb: number;
  momentAtGradeLbFt: number;
  downwardLb: number;
  windUpliftLb: number;
}

export interface GoverningLoad extends Governing {
  valueLb?: number;
  valueLbFt?: number;
}

/** The wind behind the lateral requirement, at that row's tilt setting. */
export interface LateralRequirementWind {
  tiltDeg: number;
  heightFt: number;
  velocity: VelocityPressure;
  surfaceAreaFt2: number;
  case: WindCaseResult;
}

export interface DesignResult {
  engineVersion: string;
  projectName?: string;
  input: DesignInput;
  /** Preliminary-sizing caution: the code, the AHJ and a licensed engineer govern. */
  caution: string;
  cautions: string[];
  methodNote: string;
  references: { asce: string; ibc: string; aisc: string; sections: string[] };
  geometry: {
    tiltDeg: number;
    clearanceTiltDeg: number;
    widthFt: number;
    slopeLengthFt: number;
    horizontalDepthFt: number;
    moduleCount: number;
    surfaceAreaFt2: number;
    lowestEdgeFt: number;
    highestEdgeFt: number;
    meanHeightFt: number;
    hOverL: number;
    minClearanceIn: number;
    postTopFt: number;
    spacingFt: number;
    overhangFt: number;
    /**
     * Each post: `loadShare` is its fraction of every array load (continuous-beam reaction);
     * `reactionFactor` = loadShare ÷ (tributary width ÷ array width), 1 for two posts.
     */
    posts: { id: string; xFt: number; yFt: number; tributaryWidthFt: number; gradeFt: number; heightAboveGradeFt: number; loadShare: number; reactionFactor: number }[];
    /** How the posts share the load, in words. */
    postLoadSharing: string;
  };
  wind: { edition: "7-16" | "7-22"; heightFt: number; gustFactor: number; velocity: VelocityPressure; cases: WindCaseResult[]; method: string };
  snow: SnowLoad & { totalLb: number };
  dead: { modulesLb: number; rackingLb: number; arrayLb: number; postLbPerFt: number };
  postLoads: { postId: string; tiltDeg: number; combinations: CombinationRow[] }[];
  governingLoads: { shear: GoverningLoad; moment: GoverningLoad; uplift: GoverningLoad | null; downward: GoverningLoad };
  footing: {
    diameterIn: number;
    diameterMode: "given" | "auto";
    depthIn: number;
    depthFt: number;
    depthMode: "sized" | "given";
    controllingCheck: DepthCheckId;
    requiredDepthIn: Record<"lateral" | "uplift" | "frost", number>;
    checks: FootingCheck[];
    pass: boolean;
    post: PipeMoment;
    soil: SoilValues;
    /** Smallest standard pipe whose allowable moment covers the bending demand (null: none listed does). */
    suggestedPipeSize: PipeMoment["size"] | null;
    /**
     * The lateral requirement worked through (the row needing the deepest embedment, at its own
     * tilt; its depthFt × 12 is requiredDepthIn.lateral) with the wind at that row's tilt. Absent
     * in results saved before it was added (the report then works from the post-load table).
     */
    lateralRequirement?: (LateralRequirement & { wind: LateralRequirementWind | null }) | null;
  };
  concrete: { perHole: HoleConcrete; job: ConcreteOrder; specification: ConcreteSpecification };
  options: { diameterSweep: SweepRow[]; tiltEnvelope: { rows: TiltEnvelopeRow[]; governingTiltDeg: number } | null };
  field: {
    posts: { id: string; heightAboveGradeIn: number; embedmentIn: number; postLengthIn: number }[];
    note: string;
    /**
     * Every tilt setting used (the design tilt and the rack's seasonal settings, ascending): its lowest
     * and highest edge above grade under the array centre and the smallest gap to the ground anywhere
     * under it (in). The posts are set so the steepest setting keeps the clearance asked for.
     */
    tiltSettings: { tiltDeg: number; lowestEdgeIn: number; minClearanceIn: number; highestEdgeIn: number }[];
  };
  warnings: DesignWarning[];
  /** The 3D preview's drawing data (ft). */
  geometryPreview: PreviewGeometry;
}
