/**
 * POST /v1/assess — will this design work in this flow, what kills it first, and what should change?
 *
 * Representations (our convention): JSON by default; `Accept: text/html` gives the self-contained report;
 * `?plot=<service-time|wave-map|surfactant|heat>` gives that plot alone as SVG (with any Accept that admits
 * image/svg+xml, or none). An unknown plot name is 422 naming `plot`; a plot of a mechanism that was not assessed
 * is 422 saying why.
 */
import { defineCalculation } from '../calculation.js';
import { catalogue } from '../../materials/lookup.js';
import { assessDesign } from '../../physics/design/assess.js';
import { DesignContext } from '../../physics/design/context.js';
import { problem, ProblemError, validationProblem } from '../problem.js';
import { DesignSchema, type DesignInput } from '../schemas/design.js';
import { AssessResponse } from '../schemas/responses/assess.js';
import { assessmentPlot, assessmentReport, PLOTS, type PlotName } from './assess-report.js';

/** Points of the lubricant-conductivity sweep behind the heat plot (closed forms: cheap). */
const HEAT_SWEEP_POINTS = 21;

function plotWanted(query: Record<string, unknown>): PlotName | undefined {
  const plot = query.plot;
  if (plot === undefined) return undefined;
  if (typeof plot !== 'string' || !(PLOTS as readonly string[]).includes(plot)) {
    throw validationProblem([{ path: 'plot', message: `unknown plot ${JSON.stringify(plot)}: one of ${PLOTS.join(', ')}` }]);
  }
  return plot as PlotName;
}

/** The assessment of a parsed document; `sensitivities` is the default when the document does not say. */
function assess(input: DesignInput, defaults: { sensitivities: boolean; heatSweep: boolean }) {
  const settings = input.options?.marginSensitivities ?? {};
  return assessDesign(new DesignContext(input, catalogue), input.requirements ?? {}, {
    sensitivities: settings.enabled ?? defaults.sensitivities,
    ...(settings.relativeStep === undefined ? {} : { relativeStep: settings.relativeStep }),
    ...(defaults.heatSweep ? { heatSweepPoints: HEAT_SWEEP_POINTS } : {}),
  });
}

export const assessCalculation = defineCalculation({
  name: 'assess',
  path: '/v1/assess',
  summary: 'Assess one design: every failure mode with its couplings, one verdict, sensitivities, a report',
  description:
    'Wetting, retention, waves, slip and drag, surfactant and heat on one design, with the couplings computed: the retention runs on the slip solution of the assessment (exact interfacial shear); the drainage timeline gives the filled share f(t) and the drag reduction of the partly drained surface f(t)·DR (a drained stretch taken as no-slip); a wavy interface is credited no drag reduction; the slip surviving the stated surfactant concentration sets the drag and heat. Each mechanism gets a verdict with its margin against the requirements (defaults stated in the answer); the overall verdict is works / works-with-conditions / fails with the limiting mechanism (smallest margin); sensitivities of each margin to groove width, pitch, depth, interfacial tension and lubricant viscosity by one-sided finite differences through the whole assessment. Requirements in the requirements part of the document, sensitivity settings in options.marginSensitivities. Parts the document lacks leave their mechanism "not assessed" with the reason; texture, lubricant, workingFluid and flow are required. Accept: text/html returns the self-contained report; ?plot=service-time|wave-map|surfactant|heat returns that plot as SVG.',
  body: DesignSchema,
  response: AssessResponse,
  heavy: true,
  example: {
    texture: { grooveWidth: '30 um', pitch: '60 um', grooveDepth: '15 um', grooveLength: '20 mm' },
    lubricant: { id: 'n-hexadecane', temperature: '20 degC' },
    workingFluid: { id: 'water', temperature: '20 degC' },
    contactAngles: { underWorkingFluid: { advancing: 46, receding: 0 } },
    flow: { kind: 'channel', height: '10 mm', bulkVelocity: '1 m/s' },
    waterQuality: { surfactant: { id: 'sds' }, bulkConcentration: '0.001 mM' },
    requirements: { minDragReduction: 0.02, serviceTime: '2 h', minRetainedFraction: 0.5 },
    options: { method: 'closed-form', surfactantMethod: 'scaling' },
  },
  compute: (input) => assess(input, { sensitivities: true, heatSweep: true }),
  // In a sweep: sensitivities only when options.marginSensitivities.enabled is true, no heat-plot sweep.
  computeInSweep: (input) => assess(input, { sensitivities: false, heatSweep: false }),
  present: {
    contentTypes: {
      'text/html': 'With Accept: text/html, the self-contained report (inline CSS and SVG, no external requests)',
      'image/svg+xml': 'With ?plot=service-time|wave-map|surfactant|heat, that plot alone',
    },
    check: ({ query }) => void plotWanted(query),
    render: async (answer, input, { accept, query }) => {
      const plot = plotWanted(query);
      if (plot !== undefined) {
        const svg = await assessmentPlot(plot, answer, input);
        if (typeof svg !== 'string') {
          throw new ProblemError(problem(422, 'plot-unavailable', 'The plot cannot be drawn for this design', svg.reason, { errors: [{ path: 'plot', message: svg.reason }] }));
        }
        return { contentType: 'image/svg+xml; charset=utf-8', body: svg };
      }
      if (/\btext\/html\b/.test(accept) && !/^\s*application\/json/.test(accept)) {
        return { contentType: 'text/html; charset=utf-8', body: await assessmentReport(answer, input, new Date().toISOString()) };
      }
      return undefined;
    },
  },
});
