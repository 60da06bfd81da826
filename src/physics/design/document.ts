/**
 * The design document: one description of a design and its service
 * conditions, accepted whole by every question the service answers. Values
 * are SI (the API converts unit strings before they arrive here); catalogue
 * references are not yet resolved. Every part is optional in the document;
 * each question checks the parts it needs and names a missing one
 * (MissingInputError) with the path used here.
 */
import type { FluidSpec, SurfactantSpec } from '../../core/catalogue.js';
import type { FlowSpec } from '../flow/flow.js';
import type { ContactAngles } from '../wetting/wetting.js';
import type { AssessmentRequirements } from './assess-requirements.js';

export interface TextureSpec {
  /** Groove width w, m. */
  grooveWidth: number;
  /** Texture period P (groove + ridge), m. */
  pitch: number;
  /** Groove depth d, m. */
  grooveDepth: number;
  /** Angle between the mean flow and the grooves, degrees, 0–90 (default 0: flow along the grooves). */
  flowAngle?: number;
  /** Total length of the grooves along the flow, m. */
  grooveLength?: number;
  /** Barrier spacing when the grooves are cut into segments, m. */
  segmentLength?: number;
  /** Whether lubricant can leave at the downstream end (default open). */
  grooveEnds?: 'open' | 'closed';
}

export interface LubricantSpec extends FluidSpec {
  /** Saturation solubility in the working fluid, kg/m³ (for the dissolution lifetime). */
  solubility?: number;
}

export interface OrientationSpec {
  /** Inclination of the wall from horizontal, degrees, 0–90 (90 = vertical wall). */
  inclination: number;
  /** Which way the textured face looks: up (lubricant below the working fluid) or down (lubricant above it). */
  facing?: 'up' | 'down';
  /** Where the down-slope direction points relative to the flow along the grooves. */
  downslope?: 'with-flow' | 'against-flow' | 'across-grooves';
}

export interface WaterQualitySpec {
  surfactant: SurfactantSpec;
  /** Bulk concentration, mol/m³; a list for a curve. */
  bulkConcentration: number | number[];
}

export interface SolidSpec {
  /** Conductivity of the textured solid, W/(m·K). */
  thermalConductivity: number;
  /** Solid below the groove floor, m. */
  substrateThickness: number;
}

export interface HeatingSpec {
  /** Thermal boundary condition (default uniform-flux). */
  condition?: 'uniform-flux' | 'uniform-temperature';
  /** Channel: which walls are heated (default both); a pipe is heated all round. */
  heatedWalls?: 'one' | 'both';
}

export type SlipMethodOption = 'auto' | 'exact-core' | 'closed-form' | 'field';

export interface DesignOptions {
  /** Slip (and thermal slip) method: auto (= exact-core, the default everywhere), exact-core, closed-form or field. */
  method?: SlipMethodOption;
  /** Surfactant model: scaling theory, interface solver, or auto (default). */
  surfactantMethod?: 'scaling' | 'solver' | 'auto';
  /** What the surfactant model puts below the interface (default: gas when the lubricant is under 5 % as viscous as the working fluid). */
  grooveContent?: 'lubricant' | 'gas';
  /** Length of the drainage timeline, s (default 7200). */
  duration?: number;
  /** Initially filled fraction of each segment (default 1). */
  initialFill?: number;
  /** Fill fraction the retention verdict and barrier spacing aim at (default 0.9). */
  targetFill?: number;
  /** Cells per axis of the wave regime map (default 24). */
  /** Waves: compute the regime map (default false; mapResolution implies it). */
  map?: boolean;
  mapResolution?: number;
  /** Sweep of the lubricant conductivity (heat). */
  sensitivity?: { points: number };
  /** Assessment: finite-difference sensitivities of the margins (default enabled, relative step 0.02). */
  marginSensitivities?: { enabled?: boolean; relativeStep?: number };
}

export interface DesignDocument {
  texture?: TextureSpec;
  lubricant?: LubricantSpec;
  workingFluid?: FluidSpec;
  /** Lubricant–working-fluid interfacial tension, N/m (default: catalogue against water, else the Fowkes estimate). */
  interfacialTension?: number;
  contactAngles?: ContactAngles;
  flow?: FlowSpec;
  orientation?: OrientationSpec;
  waterQuality?: WaterQualitySpec;
  solid?: SolidSpec;
  heating?: HeatingSpec;
  options?: DesignOptions;
  /** What the design must achieve (the assessment's requirements; defaults stated in its answer). */
  requirements?: AssessmentRequirements;
}

/** The questions the service answers about a design (one per calculation endpoint). */
export type Question = 'flow' | 'wetting' | 'retention' | 'slip' | 'waves' | 'surfactant' | 'heat';
