/**
 * A design being answered: the document, the catalogue to resolve its
 * references with, and everything resolved or computed so far. Each part is
 * resolved once, on first use, and shared by every question asked in the same
 * context (the fluids, the flow at the wall, the interfacial tension, the slip
 * solution per method), so an assessment of the whole design solves the slip
 * problem once however many questions rest on it.
 *
 * A question asks for a part with its own name; a part the document lacks is a
 * MissingInputError naming the document path and the question.
 */
import { checkContinuumScale } from '../continuum.js';
import type { Catalogue } from '../../core/catalogue.js';
import { DomainError, MissingInputError } from '../../core/errors.js';
import type { FluidPropertyName, FluidState } from '../../core/fluid.js';
import { Notes, type NotesLike } from '../../core/notes.js';
import type { SourcedNumber } from '../../core/values.js';
import { evaluateFlow, type FlowResult } from '../flow/flow.js';
import type { Scenario, Texture } from '../scenario.js';
import { evaluateSlip, type SlipMethod, type SlipResult } from '../slip/slip.js';
import { resolveInterfacialTension, type InterfacialTensionOrigin } from '../wetting/wetting.js';
import type { DesignDocument, Question } from './document.js';

/** What each part is needed for, in the words of a MissingInputError. */
const NEEDS: Record<string, string> = {
  texture: 'the groove geometry (grooveWidth, pitch, grooveDepth)',
  lubricant: 'the lubricant held in the grooves',
  workingFluid: 'the liquid flowing over the surface',
  flow: 'the flow over the wall, or the wall shear stress it imposes',
  interfacialTension: 'the lubricant–working-fluid interfacial tension (none is catalogued for this pair and the Fowkes estimate lacks surface tensions)',
  contactAngles: 'the contact angles of the lubricant on the flat solid',
  'contactAngles.underWorkingFluid': 'the advancing and receding angles of the lubricant under the working fluid',
  'texture.grooveLength': 'the groove length (or the barrier spacing texture.segmentLength)',
  waterQuality: 'the surfactant and its bulk concentration',
  solid: 'the conductivity and substrate thickness of the textured solid',
  'orientation.facing': 'which way the textured face looks (up or down) on an inclined wall',
  'orientation.downslope': 'which way gravity points along the grooves on an inclined wall',
};

export class DesignContext {
  readonly notes = new Notes();
  private readonly parts = new Map<string, unknown>();
  private readonly slips = new Map<SlipMethod, SlipResult>();
  /** Normalised SI echo of the parts used, for the response's `inputs`. */
  private readonly echoed: Record<string, unknown> = {};

  constructor(
    readonly document: DesignDocument,
    readonly catalogue: Catalogue,
  ) {}

  /** The document part at `path`, or a MissingInputError naming it and the question. */
  need<T>(value: T | undefined, path: string, question: Question): T {
    if (value === undefined) throw new MissingInputError(path, question, NEEDS[path] ?? path);
    return value;
  }

  /** Resolve once, keep, and merge the notes of the first resolution. */
  private once<T>(key: string, resolve: () => T): T {
    if (!this.parts.has(key)) this.parts.set(key, resolve());
    return this.parts.get(key) as T;
  }

  echo(key: string, value: unknown): void {
    this.echoed[key] = value;
  }

  inputs(): Record<string, unknown> {
    return { ...this.echoed };
  }

  texture(question: Question): Texture {
    const spec = this.need(this.document.texture, 'texture', question);
    return this.once('texture', () => {
      const texture: Texture = {
        grooveWidth: spec.grooveWidth,
        pitch: spec.pitch,
        grooveDepth: spec.grooveDepth,
        flowAngle: spec.flowAngle ?? 0,
      };
      // Below molecular size no model applies (422); below 100 nm a caution (src/physics/continuum.ts).
      checkContinuumScale(texture, this.notes);
      this.echo('texture', { ...spec, flowAngle: texture.flowAngle });
      return texture;
    });
  }

  lubricant(question: Question): FluidState {
    const spec = this.need(this.document.lubricant, 'lubricant', question);
    return this.once('lubricant', () => {
      const { solubility, ...fluid } = spec;
      const state = this.fluid(fluid, 'lubricant');
      this.echo('lubricant', { ...fluidEcho(state), ...(solubility === undefined ? {} : { solubility }) });
      return state;
    });
  }

  workingFluid(question: Question): FluidState {
    const spec = this.need(this.document.workingFluid, 'workingFluid', question);
    return this.once('workingFluid', () => {
      const state = this.fluid(spec, 'workingFluid');
      this.echo('workingFluid', fluidEcho(state));
      return state;
    });
  }

  private fluid(spec: Parameters<Catalogue['fluid']>[0], field: string): FluidState {
    const state = this.catalogue.fluid(spec, field);
    this.notes.cite(...state.references);
    for (const w of state.warnings) this.notes.warn(w.code, `${field}: ${w.message}`, w.severity);
    return state;
  }

  /** Wall conditions of the flow on the working fluid; texture sizes in wall units when the document has a texture. */
  flow(question: Question): FlowResult {
    const spec = this.need(this.document.flow, 'flow', question);
    const fluid = this.workingFluid(question);
    const texture = this.document.texture === undefined ? undefined : this.texture(question);
    return this.once('flow', () => {
      const out = evaluateFlow(fluid, spec, texture);
      this.notes.merge(out);
      this.echo('flow', spec);
      return out.result;
    });
  }

  /** Interfacial tension: given, catalogued against water, or the Fowkes estimate; undefined when none can be had and it is optional. */
  interfacialTension(question: Question, required: boolean): SourcedNumber<InterfacialTensionOrigin> | undefined {
    const lubricant = this.lubricant(question);
    const workingFluid = this.workingFluid(question);
    const tension = this.once('interfacialTension', () => {
      try {
        const t = resolveInterfacialTension(lubricant, workingFluid, this.document.interfacialTension, this.notes);
        this.echo('interfacialTension', t);
        return t;
      } catch (error) {
        if (error instanceof DomainError && error.field === 'interfacialTension') return null;
        throw error;
      }
    });
    if (tension === null && required) this.need(undefined, 'interfacialTension', question);
    return tension ?? undefined;
  }

  /** The resolved design the physics models take. */
  scenario(question: Question, tension: 'required' | 'optional'): Scenario {
    const texture = this.texture(question);
    const lubricant = this.lubricant(question);
    const workingFluid = this.workingFluid(question);
    const flow = this.flow(question);
    const gamma = this.interfacialTension(question, tension === 'required');
    return { texture, lubricant, workingFluid, flow, ...(gamma === undefined ? {} : { interfacialTension: gamma.value }) };
  }

  /** The slip solution by one method, computed once per method; its notes go to the caller. */
  slip(question: Question, method: SlipMethod): { result: SlipResult; notes: Notes } {
    const scenario = this.scenario(question, 'optional');
    let result = this.slips.get(method);
    const notes = new Notes();
    if (result === undefined) {
      const out = evaluateSlip({ scenario, method });
      notes.merge(out);
      this.parts.set(`slip-notes:${method}`, out);
      result = out.result;
      this.slips.set(method, result);
    } else {
      notes.merge(this.parts.get(`slip-notes:${method}`) as NotesLike);
    }
    return { result, notes };
  }

  /** A fluid property a question needs, or a MissingInputError naming it. */
  fluidProperty(fluid: 'lubricant' | 'workingFluid', property: FluidPropertyName, question: Question, why: string): number {
    const state = fluid === 'lubricant' ? this.lubricant(question) : this.workingFluid(question);
    const value = state[property];
    if (value === undefined) throw new MissingInputError(`${fluid}.${property}`, question, why);
    return value;
  }
}

/** A resolved fluid as echoed in responses: each property a sourced value. */
export function fluidEcho(state: FluidState): Record<string, unknown> {
  const echo: Record<string, unknown> = { id: state.id, name: state.name, temperature: state.temperature };
  for (const [property, source] of Object.entries(state.origins) as [FluidPropertyName, string][]) {
    const value = state[property];
    if (value !== undefined) echo[property] = { value, source };
  }
  return echo;
}
