/**
 * Pierwise calculation engine: preliminary wind-load and concrete-footing sizing for ground-mounted
 * fixed-tilt solar arrays. Pure TypeScript (zod only; unit factors are constants). See engine/README.md.
 */
export { ENGINE_VERSION } from "./version";
export { sizeDesign, sizeParsedDesign } from "./size-design";
export { FIELD_LABELS, fieldLabel, messageName, type FieldLabel, type FieldUnit } from "./field-labels";
export { designInputSchema, siteSchema, arraySchema, postsSchema, type DesignInput, type DesignInputDraft } from "./schema";
export { zodIssuesToFieldErrors } from "./schema-helpers";
export { parseDesignInput, safeParseDesignInput } from "./parse";
export { defaultDesignInput, twoPostDesignInput } from "./default-design";
export type { DesignResult, WindCaseResult, CombinationRow, GoverningLoad } from "./types";
export { DesignInputError, EngineInputError, type FieldIssue } from "./errors";
export type { DesignWarning } from "./warnings";

export { velocityPressure, KD_DIRECTIONALITY, type VelocityPressure, type VelocityPressureInput } from "./wind/velocity-pressure";
export { exposureCoefficientKz, kzFormula, type Edition, type Exposure } from "./wind/kz";
export { topographicFactor, type Topography } from "./wind/kzt";
export { groundElevationFactor } from "./wind/ke";
export { netPressureCoefficients, type NetPressureCoefficients, type CnPair, type Flow, type WindDirectionDeg } from "./wind/net-pressure-coefficients";
export { arrayWindForce, type ArrayWindForce } from "./wind/array-wind-force";
export { snowLoad, slopeFactorCs, SNOW_IMPORTANCE, type SnowLoad } from "./snow/snow-load";
export { asdCombinations, type Combination } from "./loads/combinations";
export { arrayLoads, GUST_FACTOR_RIGID, type ArrayLoadState } from "./loads/array-loads";
export { embedmentDepth, lateralRatio, requiredLateralDepthFt, type EmbedmentDepth } from "./footing/embedment";
export { pipeAllowableMoment, smallestPipeFor, PIPE_SIZES, STD_PIPE, type PipeSize, type PipeMoment } from "./footing/pipe";
export { soilValues, SOIL_CLASSES, type SoilInput, type SoilValues } from "./footing/soil";
export { upliftCapacityLb, pierConcreteWeightLb } from "./footing/uplift";
export { bearingPressurePsf } from "./footing/bearing";
export type { FootingCheck, CheckId, DepthCheckId } from "./footing/checks";
export { concreteForHole, type HoleConcrete } from "./concrete/concrete-for-hole";
export { concreteOrder, type ConcreteOrder } from "./concrete/concrete-order";
export { arrayDimensions } from "./geometry/array-dimensions";
export { postLayout } from "./geometry/post-layout";
export { gradeHeights } from "./geometry/grade";
export { previewGeometry, type PreviewGeometry, type Point3Ft } from "./geometry/preview";
export { levelingCuts, type LevelingCuts } from "./field/leveling-cuts";
export { UNIT_TABLE, toMetric, fromMetric, isCustomaryUnit, type CustomaryUnit } from "./units";
export { DEFER_TO_CODE, SITE_CAUTIONS, WIND_METHOD_NOTE } from "./notices";
export { concreteFromHolesAsDug, type ConcreteAsDug, type HoleAsDug, type HoleAsDugConcrete } from "./concrete/as-dug";
export { concreteSpecification, CODE_MINIMUM_STRENGTH_PSI, COLD_WEATHER_GUIDANCE, type ConcreteSpecification } from "./concrete/concrete-spec";
export { continuousBeamShares } from "./geometry/continuous-beam";
export { startingSize, type StartingSize } from "./options/starting-size";
