/**
 * The two result shapes every calculation shares.
 *
 * A sourced value is a number with where it came from: a reference key, the
 * word `input`, or the name of the estimate that produced it. The same
 * `{ value, source }` shape carries catalogue values, echoed fluid properties
 * and estimates in results.
 *
 * A verdict answers a yes/no question: `passes`, a dimensionless `margin` that
 * is positive exactly when the design passes, zero on the boundary and
 * negative beyond it, and the `criterion` in words (what was compared, and
 * how the margin is defined).
 */

export interface SourcedNumber<Source extends string = string> {
  value: number;
  source: Source;
}

export interface Verdict {
  passes: boolean;
  margin: number;
  criterion: string;
}
