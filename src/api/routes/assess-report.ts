/**
 * The assessment as a person reads it: the self-contained HTML report (design,
 * provenance, overall verdict, verdict table, the four plots, notes, safety
 * caution) or one plot alone as SVG. Built from the assessment's own answer;
 * the wave map is the waves question's map on the same design.
 */
import { catalogue } from '../../materials/lookup.js';
import { DesignContext } from '../../physics/design/context.js';
import { mechanismWords, type AssessmentResult, type MechanismName } from '../../physics/design/assess.js';
import { interfaceWaves } from '../../physics/design/questions.js';
import type { DesignDocument } from '../../physics/design/document.js';
import type { Envelope } from '../envelope.js';
import { buildReportPage, STANDARD_SAFETY_CAUTION, plotHeat, plotServiceTime, plotSurfactant, plotWaveMap, type MechanismRow, type ReportFigure } from '../report/index.js';

export const PLOTS = ['service-time', 'wave-map', 'surfactant', 'heat'] as const;
export type PlotName = (typeof PLOTS)[number];

const CAPTIONS: Record<PlotName, string> = {
  'service-time': 'Lubricant retained in the grooves and the drag reduction credited over the service time (drained stretches taken as no-slip, surfactant and wave credit applied).',
  'wave-map': 'Interface regime over the friction capillary number and the groove width in wall units, with this design.',
  surfactant: 'Share of the clean slip kept against the surfactant concentration; the stated and the tolerable concentrations are marked.',
  heat: 'Change of heat transfer against the solid-filled wall as the lubricant conductivity varies (closed-form model with the surviving slip); this design is marked.',
};

/** Cells per axis of the wave map drawn in the report. */
const MAP_CELLS = 16;

type Inputs = Record<string, { value?: number; name?: string; id?: string } & Record<string, unknown>>;

/** One plot of the assessment as SVG, or the reason it cannot be drawn. */
export async function assessmentPlot(name: PlotName, answer: Envelope, design: DesignDocument): Promise<string | { reason: string }> {
  const result = answer.result as AssessmentResult;
  const inputs = answer.inputs as Inputs;
  const req = result.requirements;
  switch (name) {
    case 'service-time':
      return plotServiceTime({
        time: result.serviceTime.time,
        retainedFraction: result.serviceTime.retainedFraction,
        dragReduction: result.serviceTime.dragReduction,
        requirements: {
          minRetainedFraction: req.minRetainedFraction.value as number,
          minDragReduction: req.minDragReduction.value as number,
          serviceTime: req.serviceTime.value as number,
        },
      });
    case 'wave-map': {
      if (result.mechanisms.waves.status !== 'assessed') return { reason: result.mechanisms.waves.reason };
      const waves = interfaceWaves(new DesignContext({ ...design, options: { ...design.options, map: true, mapResolution: MAP_CELLS } }, catalogue));
      const map = waves.result.map;
      if (!map) return { reason: 'the waves model returned no map' };
      return plotWaveMap({
        frictionCapillaryNumbers: map.frictionCapillaryNumbers,
        grooveWidthsPlus: map.grooveWidthsPlus,
        regimes: map.regimes,
        boundaryGrooveWidthPlus: map.boundaryGrooveWidthPlus,
        designPoint: map.designPoint,
      });
    }
    case 'surfactant': {
      const curve = result.surfactantCurve;
      if (!curve) return { reason: result.mechanisms.surfactant.status === 'not-assessed' ? result.mechanisms.surfactant.reason : 'no curve' };
      const tolerable = req.tolerableSurfactantConcentration.value;
      return plotSurfactant({
        bulkConcentration: curve.bulkConcentration,
        slipRetained: curve.slipRetained,
        ...(curve.stated > 0 ? { statedConcentration: curve.stated, statedSlipRetained: curve.statedSlipRetained } : {}),
        ...(tolerable !== null && tolerable > 0 ? { tolerableConcentration: tolerable } : {}),
      });
    }
    case 'heat': {
      const sweep = result.heatSweep;
      if (!sweep) return { reason: result.mechanisms.heat.status === 'not-assessed' ? result.mechanisms.heat.reason : 'no conductivity sweep' };
      const k = inputs.lubricant?.thermalConductivity as { value: number } | undefined;
      const solid = inputs.solid as { thermalConductivity?: number } | undefined;
      return plotHeat({
        lubricantConductivity: sweep.lubricantConductivity,
        nusseltRatio: sweep.nusseltRatio,
        heatFluxRatio: sweep.heatFluxRatio,
        ...(k ? { designConductivity: k.value } : {}),
        ...(solid?.thermalConductivity ? { solidConductivity: solid.thermalConductivity } : {}),
        ...(req.minHeatTransferChange.value !== null ? { minNusseltRatio: 1 + req.minHeatTransferChange.value } : {}),
      });
    }
  }
}

const um = (m: number) => `${(m * 1e6).toPrecision(3)} µm`;

/** The flow in words with units (lengths in mm). */
function flowWords(flow: Record<string, number | string | undefined>): string {
  const mm = (m: unknown) => `${(Number(m) * 1e3).toPrecision(3)} mm`;
  const parts: string[] = [String(flow.kind)];
  if (flow.height !== undefined) parts.push(`height ${mm(flow.height)}`);
  if (flow.diameter !== undefined) parts.push(`diameter ${mm(flow.diameter)}`);
  if (flow.bulkVelocity !== undefined) parts.push(`bulk velocity ${flow.bulkVelocity} m/s`);
  if (flow.freeStreamVelocity !== undefined) parts.push(`free-stream velocity ${flow.freeStreamVelocity} m/s`);
  if (flow.distance !== undefined) parts.push(`at ${mm(flow.distance)} from the leading edge`);
  if (flow.wallShearStress !== undefined) parts.push(`wall shear stress ${flow.wallShearStress} Pa`);
  return parts.join(', ');
}

function designRows(inputs: Inputs): { label: string; value: string }[] {
  const rows: { label: string; value: string }[] = [];
  const t = inputs.texture as { grooveWidth: number; pitch: number; grooveDepth: number; flowAngle: number; grooveLength?: number } | undefined;
  if (t) rows.push({ label: 'Grooves', value: `${um(t.grooveWidth)} wide, ${um(t.grooveDepth)} deep, ${um(t.pitch)} pitch, ${t.flowAngle}° to the flow${t.grooveLength ? `, ${(t.grooveLength * 1e3).toPrecision(3)} mm long` : ''}` });
  const fluid = (f: Inputs[string] | undefined) => (f ? `${f.name ?? f.id ?? 'given values'} at ${(Number(f.temperature) - 273.15).toFixed(1)} °C` : '—');
  rows.push({ label: 'Lubricant', value: fluid(inputs.lubricant) });
  rows.push({ label: 'Working fluid', value: fluid(inputs.workingFluid) });
  const flow = inputs.flow as Record<string, number | string | undefined> | undefined;
  if (flow) rows.push({ label: 'Flow', value: flowWords(flow) });
  const gamma = inputs.interfacialTension as { value: number; source: string } | undefined;
  if (gamma) rows.push({ label: 'Interfacial tension', value: `${(gamma.value * 1e3).toPrecision(3)} mN/m (${gamma.source})` });
  const water = inputs.waterQuality as { surfactant: { name: string }; bulkConcentration: number | number[] } | undefined;
  if (water) rows.push({ label: 'Water quality', value: `${water.surfactant.name} at ${String(water.bulkConcentration)} mol/m³` });
  const solid = inputs.solid as { thermalConductivity: number; substrateThickness: number } | undefined;
  if (solid) rows.push({ label: 'Solid', value: `${solid.thermalConductivity} W/(m·K), substrate ${um(solid.substrateThickness)}` });
  return rows;
}

function verdictRows(result: AssessmentResult): MechanismRow[] {
  const req = result.requirements;
  const wants: Record<MechanismName, string> = {
    wetting: 'lubricant stable in the texture under the working fluid',
    retention: `retained ≥ ${(100 * (req.minRetainedFraction.value as number)).toFixed(0)} % after ${req.serviceTime.value} s`,
    waves: `calm, reserve ≥ ${req.minWaveMargin.value}`,
    slipAndDrag: `drag reduction ≥ ${(100 * (req.minDragReduction.value as number)).toFixed(1)} % after ${req.serviceTime.value} s`,
    surfactant: `≥ ${(100 * (req.minSlipRetained.value as number)).toFixed(0)} % of the slip kept at ${req.tolerableSurfactantConcentration.value ?? '—'} mol/m³`,
    heat: `heat transfer change ≥ ${(100 * (req.minHeatTransferChange.value as number)).toFixed(0)} %`,
  };
  return (Object.keys(wants) as MechanismName[]).map((name) => {
    const m = result.mechanisms[name];
    if (m.status === 'not-assessed') return { mechanism: mechanismWords(name), status: 'not-evaluated', verdict: m.reason, margin: null, requirement: wants[name] };
    const thin = m.verdict.passes && m.verdict.margin < 0.1;
    return { mechanism: mechanismWords(name), status: !m.verdict.passes ? 'fail' : thin ? 'conditional' : 'pass', verdict: m.summary, margin: m.verdict.margin, requirement: wants[name] };
  });
}

/** The whole report page of an assessment answer. */
export async function assessmentReport(answer: Envelope, design: DesignDocument, generatedAt: string): Promise<string> {
  const result = answer.result as AssessmentResult;
  const figures: ReportFigure[] = [];
  const notes: string[] = [];
  const svgs = await Promise.all(PLOTS.map((p) => assessmentPlot(p, answer, design)));
  PLOTS.forEach((p, i) => {
    const svg = svgs[i];
    if (typeof svg === 'string') figures.push({ svg, caption: CAPTIONS[p] });
    else notes.push(`Plot ${p} not drawn: ${svg.reason}`);
  });
  const ranked = result.sensitivities?.ranked ?? [];
  const inputs = answer.inputs as Inputs;
  const lubricant = inputs.lubricant?.name ?? 'lubricant';
  return buildReportPage({
    title: `Assessment: ${String(lubricant)} in ${um((inputs.texture as { grooveWidth: number }).grooveWidth)} grooves`,
    design: designRows(inputs),
    inputs: answer.inputs,
    provenance: { service: answer.provenance.service, version: answer.provenance.version, inputsHash: answer.provenance.inputsHash, generatedAt, models: answer.provenance.models },
    overall: {
      verdict: result.overall.verdict,
      ...(result.overall.limitingMechanism ? { limitingMechanism: mechanismWords(result.overall.limitingMechanism) } : {}),
      summary:
        result.overall.summary +
        (result.overall.conditions.length ? ` Conditions: ${result.overall.conditions.join('; ')}.` : '') +
        (ranked.length ? ` Changes that raise the limiting margin most: ${ranked.slice(0, 3).map((r) => `${r.change} ${r.knob} (+${r.marginGainForTenPercent.toPrecision(2)} for 10 %)`).join(', ')}.` : ''),
    },
    mechanisms: verdictRows(result),
    figures,
    assumptions: [...answer.assumptions, ...notes],
    warnings: answer.warnings,
    references: answer.references,
    // The catalogue's notes on the fluids and surfactant this design uses join the standard caution.
    safetyCaution: [STANDARD_SAFETY_CAUTION, ...answer.safety.map((s) => `${s.name}: ${s.note}`)].join(' '),
  });
}
