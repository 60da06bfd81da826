import { describe, expect, it } from 'vitest';
import { alkaneMolarMass, dipprDensity105, dipprPolynomial100, dipprViscosity101 } from '../../src/materials/dippr.js';

describe('DIPPR correlation forms (Perry 2008, Section 2)', () => {
  it('Eq. 100 evaluates the polynomial C1 + C2 T + C3 T² (exact arithmetic: 1 + 2·3 + 4·9 = 43)', () => {
    expect(dipprPolynomial100([1, 2, 4])(3)).toBe(43);
    expect(dipprPolynomial100([1, 2, 4], 0.5)(3)).toBe(21.5);
  });
  it('Eq. 101 with C4 = 0 reduces to exp(C1 + C2/T + C3 ln T) (exact: C = (0, 0, 1) gives μ = T)', () => {
    expect(dipprViscosity101(0, 0, 1, 0, 0)(300)).toBeCloseTo(300, 10);
    expect(dipprViscosity101(Math.log(2), 0, 0, 0, 0)(123)).toBeCloseTo(2, 14);
  });
  it('Eq. 105 gives C1/C2 × M at the critical temperature C3 (exact limit of the form)', () => {
    expect(dipprDensity105(400, 0.25, 600, 0.2857, 0.1)(600)).toBeCloseTo(160, 12);
  });
  it('alkane molar masses from IUPAC conventional atomic weights: decane 142.286 g/mol (CIAAW, C 12.011, H 1.008)', () => {
    expect(alkaneMolarMass(10) * 1000).toBeCloseTo(142.286, 3);
    expect(alkaneMolarMass(16) * 1000).toBeCloseTo(226.448, 3);
  });
});
