import { describe, expect, it } from 'vitest';
import { velocityPlusAtWallDistance, wallDistanceAtVelocityPlus } from '../../../src/physics/flow/wall-profile.js';

describe('Spalding wall law (Spalding 1961)', () => {
  it('round trip u⁺ → y⁺ → u⁺ to 1e-12 (inverse of the explicit formula)', () => {
    for (const u of [0.1, 3, 8, 15, 25]) expect(velocityPlusAtWallDistance(wallDistanceAtVelocityPlus(u))).toBeCloseTo(u, 11);
  });
  it('viscous sublayer u⁺ = y⁺ and log law u⁺ = 2.5 ln y⁺ + 5.5 (Spalding 1961, Table 1 limits)', () => {
    expect(velocityPlusAtWallDistance(1)).toBeCloseTo(1, 3);
    const logLaw = 2.5 * Math.log(2000) + 5.5;
    expect(Math.abs(velocityPlusAtWallDistance(2000) - logLaw)).toBeLessThan(0.03);
  });
});
