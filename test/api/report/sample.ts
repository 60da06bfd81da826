/**
 * Realistic inputs for the report builders, taken from what the existing
 * endpoints return for one invented demo design (closed-form methods, so it
 * stays quick). The drag reduction over time is demo data only: the clean
 * drag reduction of /v1/slip scaled by the retained fraction (the coupling
 * the assessment will compute properly). Nothing here is a check value.
 */
import type { FastifyInstance } from 'fastify';
import type {
  DesignWindowPlotInput,
  HeatPlotInput,
  ReportPageInput,
  ServiceTimePlotInput,
  SurfactantPlotInput,
  WaveMapPlotInput,
} from '../../../src/api/report/index.js';
import {
  buildReportPage,
  designWindowGridCells,
  plotDesignWindow,
  plotHeat,
  plotServiceTime,
  plotSurfactant,
  plotWaveMap,
} from '../../../src/api/report/index.js';

/**
 * A 3 × 3 regime map on decades (centres 1, 10, 100 on both axes, so the cell edges run from 10^-0.5 to 10^2.5),
 * three cells of each regime, the design at (We_τ, w⁺) = (10, 1): positions on it are known exactly.
 */
export const SMALL_WAVE_MAP: WaveMapPlotInput = {
  frictionCapillaryNumbers: [1, 10, 100],
  grooveWidthsPlus: [1, 10, 100],
  regimes: [
    ['calm', 'calm', 'marginal'],
    ['calm', 'marginal', 'wavy'],
    ['marginal', 'wavy', 'wavy'],
  ],
  boundaryGrooveWidthPlus: [30, 3, null],
  designPoint: { frictionCapillaryNumber: 10, grooveWidthPlus: 1 },
};

/** Invented demo design: dodecane in 30 µm grooves under water in a 10 mm channel at 1 m/s. */
export const DEMO_DESIGN = {
  texture: { grooveWidth: '30 um', pitch: '60 um', grooveDepth: '15 um' },
  lubricant: { id: 'n-dodecane', temperature: '20 degC' },
  workingFluid: { id: 'water', temperature: '20 degC' },
  flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
} as const;

export interface SampleInputs {
  serviceTime: ServiceTimePlotInput;
  waveMap: WaveMapPlotInput;
  surfactant: SurfactantPlotInput;
  heat: HeatPlotInput;
  designWindow: DesignWindowPlotInput;
  /** Envelope pieces of one endpoint, for the page's notes and provenance. */
  waves: { warnings: ReportPageInput['warnings']; assumptions: string[]; references: ReportPageInput['references']; provenance: { inputsHash: string; models: string[] } };
}

async function post(app: FastifyInstance, url: string, payload: object) {
  const res = await app.inject({ method: 'POST', url, payload });
  if (res.statusCode !== 200) throw new Error(`${url}: ${res.statusCode} ${res.body}`);
  return res.json();
}

export async function sampleInputs(app: FastifyInstance): Promise<SampleInputs> {
  const [retention, slip, waves, surfactant, heat] = await Promise.all([
    post(app, '/v1/retention', {
      ...DEMO_DESIGN,
      texture: { ...DEMO_DESIGN.texture, grooveLength: '20 mm' },
      contactAngles: { underWorkingFluid: { advancing: 46, receding: 0 } },
      options: { duration: '2 h' },
    }),
    post(app, '/v1/slip', { ...DEMO_DESIGN, options: { method: 'closed-form' } }),
    // The regime map is computed only when asked for.
    post(app, '/v1/waves', { ...DEMO_DESIGN, options: { map: true } }),
    // Transverse grooves here: along straight streamwise grooves no surfactant gradient builds up and the curve is flat.
    post(app, '/v1/surfactant', {
      ...DEMO_DESIGN,
      texture: { ...DEMO_DESIGN.texture, flowAngle: 90 },
      waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: '0.001 mM' },
      options: { method: 'closed-form', surfactantMethod: 'scaling' },
    }),
    post(app, '/v1/heat', {
      ...DEMO_DESIGN,
      flow: { kind: 'channel', height: '200 um', bulkVelocity: '0.05 m/s' },
      solid: { thermalConductivity: '0.2 W/(m*K)', substrateThickness: '20 um' },
      options: { method: 'closed-form', sensitivity: { points: 21 } },
    }),
  ]);
  const timeline = retention.result.timeline as { time: number; retainedFraction: number }[];
  const cleanDragReduction = slip.result.drag.dragReduction as number;
  const map = waves.result.map;
  // A demo window: feasible in a band of widths and depths, limited elsewhere by named requirements.
  const widths = Array.from({ length: 16 }, (_, i) => (5 + 5 * i) * 1e-6);
  const depths = Array.from({ length: 12 }, (_, i) => (2 + 3 * i) * 1e-6);
  const limiting = depths.map((d) =>
    widths.map((w) => (w > 55e-6 ? 'waves calm' : d < 8e-6 ? 'lubricant retained' : w < 15e-6 ? 'drag reduction' : null)),
  );
  return {
    serviceTime: {
      time: timeline.map((p) => p.time),
      retainedFraction: timeline.map((p) => p.retainedFraction),
      dragReduction: timeline.map((p) => cleanDragReduction * p.retainedFraction),
      requirements: { minRetainedFraction: 0.5, minDragReduction: 0.02, serviceTime: 3600 },
    },
    waveMap: {
      frictionCapillaryNumbers: map.frictionCapillaryNumbers,
      grooveWidthsPlus: map.grooveWidthsPlus,
      regimes: map.regimes,
      boundaryGrooveWidthPlus: map.boundaryGrooveWidthPlus,
      designPoint: map.designPoint,
    },
    surfactant: {
      bulkConcentration: surfactant.result.curve.bulkConcentration,
      slipRetained: surfactant.result.curve.slipRetained,
      statedConcentration: 0.001,
      statedSlipRetained: surfactant.result.slipRetained,
      tolerableConcentration: 1e-4,
    },
    heat: {
      lubricantConductivity: heat.result.sensitivity.lubricantConductivity,
      nusseltRatio: heat.result.sensitivity.nusseltRatio,
      heatFluxRatio: heat.result.sensitivity.heatFluxRatio,
      designConductivity: heat.inputs.lubricant.thermalConductivity.value,
      solidConductivity: 0.2,
    },
    designWindow: {
      cells: designWindowGridCells(widths, depths, limiting),
      best: { grooveWidth: 30e-6, grooveDepth: 20e-6 },
      note: 'pitch 2 × groove width, n-dodecane under water, 1 m/s (demo data)',
    },
    waves: { warnings: waves.warnings, assumptions: waves.assumptions, references: waves.references, provenance: waves.provenance },
  };
}

/** A whole report page from the sample inputs: every plot, notes of the waves endpoint, an invented verdict table. */
export async function sampleReportPage(app: FastifyInstance, title = 'Demo: dodecane in 30 µm grooves, 10 mm water channel'): Promise<{ html: string; inputs: SampleInputs; page: ReportPageInput }> {
  const inputs = await sampleInputs(app);
  const figures = [
    { svg: await plotServiceTime(inputs.serviceTime), caption: 'Lubricant retained in the grooves and the drag reduction it still gives, over two hours of service (demo coupling).' },
    { svg: await plotWaveMap(inputs.waveMap), caption: 'Interface regime over the friction capillary number and the groove width in wall units, with this design.' },
    { svg: await plotSurfactant(inputs.surfactant), caption: 'Fraction of the clean slip kept as sodium dodecyl sulfate accumulates in the water; the stated concentration is marked.' },
    { svg: await plotHeat(inputs.heat), caption: 'Change of heat transfer against the solid-filled wall as the lubricant conductivity varies; this design is marked.' },
    { svg: await plotDesignWindow(inputs.designWindow), caption: 'Designs meeting every requirement (demo data) and the requirement that limits the others.' },
  ];
  const page: ReportPageInput = {
    title,
    design: [
      { label: 'Grooves', value: '30 µm wide, 15 µm deep, 60 µm pitch, along the flow' },
      { label: 'Lubricant', value: 'n-dodecane at 20 °C' },
      { label: 'Working fluid', value: 'water at 20 °C' },
      { label: 'Flow', value: 'channel 10 mm high, bulk velocity 1 m/s' },
    ],
    inputs: DEMO_DESIGN,
    provenance: { service: 'oilskin', version: '0.1.0', inputsHash: inputs.waves.provenance.inputsHash, generatedAt: '2026-01-01T00:00:00Z', models: inputs.waves.provenance.models },
    overall: { verdict: 'works-with-conditions', limitingMechanism: 'lubricant retention', summary: 'Demo verdicts: the assessment will supply these.' },
    mechanisms: [
      { mechanism: 'wetting', status: 'pass', verdict: 'lubricant stays in the texture', margin: 0.4, requirement: 'stable under water' },
      { mechanism: 'lubricant retention', status: 'conditional', verdict: '53 % retained after 2 h', margin: 0.06, requirement: 'retained ≥ 50 % after 2 h' },
      { mechanism: 'interface waves', status: 'pass', verdict: 'calm', margin: 0.8, requirement: 'calm' },
      { mechanism: 'slip and drag', status: 'fail', verdict: '0.3 % drag reduction', margin: -0.85, requirement: 'drag reduction ≥ 2 %' },
      { mechanism: 'surfactant', status: 'pass', verdict: '84 % of the slip kept', margin: 0.68, requirement: 'half the slip kept at 0.001 mM' },
      { mechanism: 'heat transfer', status: 'not-evaluated', verdict: 'no solid given', margin: null, requirement: '—' },
    ],
    figures,
    assumptions: inputs.waves.assumptions,
    warnings: inputs.waves.warnings,
    references: inputs.waves.references,
  };
  return { html: buildReportPage(page), inputs, page };
}
