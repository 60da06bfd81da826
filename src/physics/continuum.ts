/**
 * Where the continuum models of this service stop applying: texture lengths
 * (groove width, groove depth, pitch) approaching molecular size.
 *
 * Every model here (Stokes flow in the grooves, capillary pinning, diffusion
 * of surfactant) treats the liquids as continua with bulk viscosity, surface
 * tension and no-slip walls. Two bounds, both on the smallest texture length:
 *
 * - below {@link CONTINUUM_LIMITS.smallestLength} (1 nm, about three water
 *   molecules and less than the length of one alkane lubricant molecule) the
 *   groove holds too few molecules for any continuum description: the input
 *   is refused (DomainError, code `outside-model-range`, HTTP 422). Continuum
 *   theory "breaks down only at the nanometer level" (Gărăjeu, Gouin &
 *   Saccomandi 2013, abstract).
 * - below {@link CONTINUUM_LIMITS.cautionLength} (100 nm) a result is given
 *   with the warning `continuum-limit`: capillary filling of channels narrower
 *   than about 100 nm no longer follows the continuum (Washburn) prediction
 *   (experiments of Persson et al. 2007, as discussed by Hansen et al. 2015),
 *   and molecular layering at the walls, wall slip and the finite size of
 *   lubricant molecules (1–2 nm for the alkanes) start to matter.
 *
 * References
 * 1. Gărăjeu M., Gouin H., Saccomandi G. (2013) Scaling Navier–Stokes equation
 *    in nanotubes. Phys. Fluids 25, 082003. doi:10.1063/1.4818159.
 * 2. Hansen J.S., Dyre J.C., Daivis P., Todd B.D., Bruus H. (2015) Continuum
 *    nanofluidics. Langmuir 31, 13275–13289.
 */
import { DomainError } from '../core/errors.js';
import type { Notes } from '../core/notes.js';
import { REFERENCES } from '../core/references.js';



export const CONTINUUM_LIMITS = {
  /** Smallest texture length any model here accepts, m. */
  smallestLength: 1e-9,
  /** Texture lengths below this get the `continuum-limit` warning, m. */
  cautionLength: 1e-7,
} as const;

/**
 * Refuse texture lengths below molecular size and warn below 100 nm (see the
 * module comment). Lengths that are not positive finite numbers are left to
 * the models' own checks.
 * @param texture groove width, groove depth and pitch, m
 * @param notes where the warning goes
 * @param prefix request path of the texture object (default `texture`)
 */
export function checkContinuumScale(texture: { grooveWidth: number; grooveDepth: number; pitch: number }, notes: Notes, prefix = 'texture'): void {
  const lengths: [keyof typeof texture, string][] = [
    ['grooveWidth', 'groove width'],
    ['grooveDepth', 'groove depth'],
    ['pitch', 'pitch'],
  ];
  for (const [key, words] of lengths) {
    const value = texture[key];
    if (!(Number.isFinite(value) && value > 0)) continue;
    if (value < CONTINUUM_LIMITS.smallestLength) {
      throw new DomainError(
        `${words} ${value.toPrecision(3)} m is below ${CONTINUUM_LIMITS.smallestLength} m (1 nm), about the size of a few molecules: no continuum model applies`,
        { field: `${prefix}.${key}`, code: 'outside-model-range' },
      );
    }
  }
  const smallest = Math.min(texture.grooveWidth, texture.grooveDepth, texture.pitch);
  if (smallest < CONTINUUM_LIMITS.cautionLength) {
    notes
      .warn(
        'continuum-limit',
        `The smallest texture length is ${(smallest * 1e9).toPrecision(3)} nm, below 100 nm: molecular layering, wall slip and the size of the lubricant molecules start to matter, and the continuum results are rough estimates.`,
        'caution',
      )
      .cite(REFERENCES.garajeu2013, REFERENCES.hansen2015);
  }
}
