/** Worker entry for the report tests (run by piscina, as the service's heavy work is): renders the plot it is given. */
import { plotSurfactant, type SurfactantPlotInput } from '../../../src/api/report/index.js';

export default function render(input: SurfactantPlotInput): Promise<string> {
  return plotSurfactant(input);
}
