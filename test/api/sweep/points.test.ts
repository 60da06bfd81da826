/**
 * The point documents of a sweep without a parse per point: a part whose axes set numbers along plain paths is
 * parsed once and patched; any other part is parsed at each point (distinct parts remembered). The witness is the
 * design schema itself: each point's document must equal what parsing that point's document whole gives.
 */
import { describe, expect, it } from 'vitest';
import { DesignSchema } from '../../../src/api/schemas/design.js';
import { childSchema, numberPatchable } from '../../../src/api/sweep/paths.js';
import { planSweep } from '../../../src/api/sweep/plan.js';
import { pointDocument } from '../../../src/api/sweep/points.js';

const design = {
  workingFluid: { id: 'water', temperature: '20 degC' },
  flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
  texture: { grooveWidth: '50 um', pitch: '100 um', grooveDepth: '20 um' },
};

describe('numberPatchable', () => {
  const part = (name: string) => childSchema(DesignSchema, name)!;
  it('a number in a flow kind is patchable; the discriminator, a texture length (groove below pitch is checked) and a fluid (its own check) are not', () => {
    expect(numberPatchable(part('flow'), ['bulkVelocity'])).toBe(true);
    expect(numberPatchable(part('flow'), ['height'])).toBe(true);
    expect(numberPatchable(part('flow'), ['kind'])).toBe(false);
    expect(numberPatchable(part('texture'), ['grooveWidth'])).toBe(false);
    expect(numberPatchable(part('workingFluid'), ['temperature'])).toBe(false);
    expect(numberPatchable(part('texture'), ['noSuchField'])).toBe(false);
  });
});

describe('point documents', () => {
  it('patched (flow) and parsed (texture) parts equal a whole parse of every point, invalid points carry the field', () => {
    const widths = ['20 um', '150 um', '60 um'];
    const velocities = ['0.5 m/s', '2 m/s'];
    const plan = planSweep({
      calculation: 'flow',
      design,
      axes: [
        { path: 'flow.bulkVelocity', values: velocities },
        { path: 'texture.grooveWidth', values: widths },
      ],
    });
    expect(plan.parts.find((p) => p.name === 'flow')!.template).toBeDefined();
    expect(plan.parts.find((p) => p.name === 'texture')!.template).toBeUndefined();
    for (let i = 0; i < 6; i++) {
      const raw = { ...design, flow: { ...design.flow, bulkVelocity: velocities[Math.floor(i / 3)] }, texture: { ...design.texture, grooveWidth: widths[i % 3] } };
      const whole = DesignSchema.safeParse(raw);
      const at = pointDocument(plan, i);
      if (whole.success) expect(at).toEqual({ document: whole.data });
      else {
        expect('problem' in at && at.problem.errors?.[0]?.path).toBe('texture.grooveWidth');
        expect(i % 3).toBe(1);
      }
    }
    // Three widths, each parsed once whatever the velocity.
    expect(plan.parts.find((p) => p.name === 'texture')!.memo.size).toBe(3);
  });

  it('a number set into a flow the base lacks the field for is still refused at every point', () => {
    const plan = planSweep({ calculation: 'flow', design: { ...design, flow: { kind: 'wall-shear', wallShearStress: 1 } }, axes: [{ path: 'flow.bulkVelocity', values: [1, 2] }] });
    expect(plan.parts[0]!.template).toBeUndefined();
    for (const i of [0, 1]) expect('problem' in pointDocument(plan, i)).toBe(true);
  });
});
