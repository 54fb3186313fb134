/**
 * The 3D preview of the array, grade and footings. Import only `DesignPreviewLazy`: it loads the
 * scene (three.js) in its own chunk, client-side only.
 */
export { DesignPreviewLazy } from "./design-preview-lazy";
export type { DesignPreviewProps } from "./design-preview";
export type { UnitSystem } from "./preview-labels";
