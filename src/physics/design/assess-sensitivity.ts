/**
 * Sensitivities of an assessment's margins to the design's main knobs: groove
 * width, pitch, groove depth, interfacial tension and lubricant viscosity. Each
 * is a one-sided finite difference through the whole assessment (every coupling
 * included): the document with one knob scaled by (1 + h) is assessed afresh
 * and Δmargin/ln(1 + h) reported (a backward step where the forward one would
 * make the groove as wide as the pitch). Computed, not estimated: a margin that
 * jumps (a wave regime changing within the step) shows as a large value. Where the
 * base design's drainage settled long before the service time, its retention margin
 * is the steady column's, and so is each step's: the steps skip the finite-volume
 * timeline, which a few-percent change of one knob cannot make unsettled. Where it did
 * not, each step reads its own timeline at the service time, as the base does.
 */
import type { DesignDocument } from './document.js';
import type { EffectiveRequirements } from './assess-requirements.js';
import { evaluateMechanisms, MECHANISMS, type MechanismName } from './assess-mechanisms.js';
import { DesignContext } from './context.js';

export type Knob = 'grooveWidth' | 'pitch' | 'grooveDepth' | 'interfacialTension' | 'lubricantViscosity';
export const KNOBS: readonly Knob[] = ['grooveWidth', 'pitch', 'grooveDepth', 'interfacialTension', 'lubricantViscosity'];

export interface KnobSensitivity {
  knob: Knob;
  /** The knob's value in the design, SI. */
  value: number;
  /** The value assessed for the difference, SI. */
  perturbedValue: number;
  /** Δmargin/Δln(knob) of each assessed mechanism (null where the perturbed design could not assess it). */
  marginDerivatives: Partial<Record<MechanismName, number | null>>;
}

export interface RankedChange {
  knob: Knob;
  /** Which way the knob must move to raise the limiting margin. */
  change: 'increase' | 'decrease';
  /** Δ(limiting margin)/Δln(knob). */
  derivative: number;
  /** Estimated change of the limiting margin for a 10 % move in the helpful direction (linear). */
  marginGainForTenPercent: number;
}

export interface Sensitivities {
  relativeStep: number;
  limitingMechanism: MechanismName | null;
  knobs: KnobSensitivity[];
  /** Knobs ranked by how much they move the limiting margin (largest first); knobs that do not move it are left out. */
  ranked: RankedChange[];
  /** Knobs that could not be varied, with the reason. */
  skipped: { knob: Knob; reason: string }[];
}

/** The knob's value in the design (resolved through the context), or a reason it cannot be varied. */
function knobValue(ctx: DesignContext, knob: Knob): number | string {
  const t = ctx.texture('slip');
  switch (knob) {
    case 'grooveWidth':
      return t.grooveWidth;
    case 'pitch':
      return t.pitch;
    case 'grooveDepth':
      return t.grooveDepth;
    case 'interfacialTension':
      return ctx.interfacialTension('slip', false)?.value ?? 'no interfacial tension is known for this pair';
    case 'lubricantViscosity':
      return ctx.lubricant('slip').viscosity;
  }
}

/** The document with one knob set to `value` (explicit values override catalogue values). */
function withKnob(doc: DesignDocument, knob: Knob, value: number): DesignDocument {
  const texture = doc.texture as NonNullable<DesignDocument['texture']>;
  switch (knob) {
    case 'grooveWidth':
    case 'pitch':
    case 'grooveDepth':
      return { ...doc, texture: { ...texture, [knob]: value } };
    case 'interfacialTension':
      return { ...doc, interfacialTension: value };
    case 'lubricantViscosity': {
      const { kinematicViscosity: _nu, ...lubricant } = doc.lubricant ?? {};
      return { ...doc, lubricant: { ...lubricant, viscosity: value } };
    }
  }
}

export function assessSensitivities(
  ctx: DesignContext,
  requirements: EffectiveRequirements,
  baseMargins: Partial<Record<MechanismName, number>>,
  limiting: MechanismName | null,
  relativeStep: number,
  /** The base design's drainage settled long before the service time (its evaluation's `drainageSettled`). */
  drainageSettled = false,
): Sensitivities {
  const knobs: KnobSensitivity[] = [];
  const skipped: Sensitivities['skipped'] = [];
  for (const knob of KNOBS) {
    const value = knobValue(ctx, knob);
    if (typeof value === 'string') {
      skipped.push({ knob, reason: value });
      continue;
    }
    const texture = ctx.texture('slip');
    // A forward step in width must leave a ridge: step backward then.
    const forward = !(knob === 'grooveWidth' && value * (1 + relativeStep) >= texture.pitch);
    const factor = forward ? 1 + relativeStep : 1 - relativeStep;
    const perturbedValue = value * factor;
    const perturbed = new DesignContext(withKnob(ctx.document, knob, perturbedValue), ctx.catalogue);
    const outcome = evaluateMechanisms(perturbed, requirements, { marginsOnly: true, drainageSettled }).mechanisms;
    const derivatives: KnobSensitivity['marginDerivatives'] = {};
    for (const name of MECHANISMS) {
      const before = baseMargins[name];
      if (before === undefined) continue;
      const after = outcome[name];
      derivatives[name] = after.status === 'assessed' ? (after.verdict.margin - before) / Math.log(factor) : null;
    }
    knobs.push({ knob, value, perturbedValue, marginDerivatives: derivatives });
  }
  const ranked: RankedChange[] = [];
  if (limiting !== null) {
    for (const k of knobs) {
      const d = k.marginDerivatives[limiting];
      if (d === null || d === undefined || d === 0) continue;
      ranked.push({ knob: k.knob, change: d > 0 ? 'increase' : 'decrease', derivative: d, marginGainForTenPercent: Math.abs(d) * Math.log(1.1) });
    }
    ranked.sort((a, b) => Math.abs(b.derivative) - Math.abs(a.derivative));
  }
  return { relativeStep, limitingMechanism: limiting, knobs, ranked, skipped };
}
