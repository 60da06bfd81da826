/**
 * Presentation of results: plots rendered on the server as standalone SVG and
 * the self-contained HTML report. Builders take small plain inputs of their
 * own (documented on each type); callers adapt their results to them.
 */
export { renderPlot, scopeSvgIds, type RenderOptions } from './render.js';
export { plotServiceTime, serviceTimeSpec, type ServiceTimePlotInput } from './plot-service-time.js';
export { plotWaveMap, waveMapSpec, type WaveMapPlotInput } from './plot-wave-map.js';
export { plotSurfactant, surfactantSpec, type SurfactantPlotInput } from './plot-surfactant.js';
export { plotHeat, heatSpec, type HeatPlotInput } from './plot-heat.js';
export {
  designWindowGridCells,
  designWindowSpec,
  FEASIBLE_LABEL,
  plotDesignWindow,
  type DesignWindowCell,
  type DesignWindowPlotInput,
} from './plot-design-window.js';
export {
  buildReportPage,
  formatMargin,
  STANDARD_SAFETY_CAUTION,
  type MechanismRow,
  type MechanismStatus,
  type OverallVerdict,
  type ReportFigure,
  type ReportPageInput,
} from './page.js';
export { escapeHtml } from './escape.js';
