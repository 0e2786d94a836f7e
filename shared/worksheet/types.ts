/** What the worksheet evaluator returns, and the shapes shared with the check kit. */

/** A computed or parsed quantity: its SI value, the SI unit of that value, and a display string. */
export interface QuantityValue {
  /** Value in coherent SI units (e.g. newtons for a force, kelvins for a temperature). */
  si: number;
  /** The SI unit of `si` in mathjs syntax, e.g. "N", "W", "K", "m / s", "" for a pure number. */
  unit: string;
  /** Human display with a sensible SI prefix and significant figures, e.g. "1.33 mN". */
  display: string;
}

export type EvaluationErrorKind = 'syntax' | 'unknown_symbol' | 'dimension' | 'refused' | 'range' | 'value';

export interface EvaluationError {
  kind: EvaluationErrorKind;
  /** Names the step (or input) and the cause in plain words, e.g. "Step F_bound: cannot add W and N …". */
  message: string;
}

export interface InputResult {
  name: string;
  label: string;
  value?: QuantityValue;
  error?: EvaluationError;
}

export interface StepResult {
  name: string;
  label: string;
  value?: QuantityValue;
  error?: EvaluationError;
}

export interface CheckResultRow {
  name: string;
  label: string;
  /** Absent when the check could not be evaluated (see error). */
  holds?: boolean;
  /** The holds/fails message with `{name}` quotes filled in. */
  message?: string;
  error?: EvaluationError;
}

export interface PlotSeries {
  name: string;
  label: string;
  /** Display unit of the values. */
  unit: string;
  /** One value per x; null where that point could not be computed. */
  values: (number | null)[];
}

export interface PlotResult {
  name: string;
  label: string;
  x: { name: string; label: string; unit: string; values: number[]; scale: 'linear' | 'log' };
  series: PlotSeries[];
  yScale: 'linear' | 'log';
  error?: EvaluationError;
}

export interface WorksheetResult {
  /** True when every input, step and check evaluated without error. */
  ok: boolean;
  inputs: InputResult[];
  steps: StepResult[];
  checks: CheckResultRow[];
  plots: PlotResult[];
  /** Set when the evaluation ran past its time budget (EvaluateOptions.budgetMs) and stopped early. */
  overBudget?: boolean;
}

/**
 * A numeric function of the standard check kit, callable from worksheet expressions. Arguments
 * arrive converted to the SI units declared here (a dimension mismatch is an error at that step);
 * the result is given the declared SI unit.
 */
export interface KitFunction {
  summary: string;
  args: { name: string; unit: string }[];
  unit: string;
  fn: (...si: number[]) => number;
}
