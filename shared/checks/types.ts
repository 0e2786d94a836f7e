/**
 * The standard check kit (DESIGN.md §4): typed functions, each returning its outputs in SI, a
 * verdict in plain words with the numbers, and series for plots where they help.
 */

export const CHECK_NAMES = [
  'photon-bound',
  'break-even-speed',
  'carnot',
  'first-law',
  'momentum-ledger',
  'sideways-beam',
  'artifact-budget',
  'rocket-equation',
  'light-speed',
  'faraday-yield',
  'nuclear-signature',
  'road-load',
  'light-converter-limits',
  'landauer',
] as const;
export type CheckName = (typeof CHECK_NAMES)[number];

export interface CheckInputSpec {
  name: string;
  label: string;
  /** The SI unit (mathjs syntax) the run function receives the value in; "" for a pure number. */
  unit: string;
  /** The unit a screen shows by default, e.g. "mN" for a small thrust; defaults to `unit`. */
  displayUnit?: string;
  /** A typed quantity, e.g. "1 mN", "1.5 kW", "300 K". */
  default: string;
  /**
   * What the value is: "absolute" (the default when absent) reads "20 degC" as 293.15 K; "difference"
   * is for a temperature rise or a ΔT and reads "2 degC" as 2 K and "3.6 degF" as 2 K (DESIGN.md §4).
   */
  kind?: 'absolute' | 'difference';
  /** Inclusive bounds in SI (the `unit` above). */
  min?: number;
  max?: number;
  /** Whole numbers only (counts, e.g. steps). */
  integer?: boolean;
  help?: string;
  /** Named presets a screen may offer, e.g. electron / proton for a particle's mass. */
  presets?: { label: string; value: string }[];
}

export interface CheckOutput {
  name: string;
  label: string;
  si: number;
  /** SI unit of `si` (mathjs syntax), "" for a pure number. */
  unit: string;
  /** The unit to show it in; SI with a prefix chosen for the value when absent. */
  displayUnit?: string;
}

export interface CheckVerdict {
  /** Whether the check's condition (CheckDefinition.condition) holds for these figures. */
  holds: boolean;
  /** Plain words with the numbers, e.g. "The claimed thrust is 3.4 × 10^5 times the photon bound …". */
  message: string;
}

export interface LinePlot {
  kind: 'line';
  name: string;
  title: string;
  x: { label: string; unit: string; values: ArrayLike<number> };
  series: { name: string; label: string; unit: string; values: ArrayLike<number> }[];
  yScale: 'linear' | 'log';
}

/** One bar per force (or other figure), for comparisons across orders of magnitude. */
export interface BarPlot {
  kind: 'bars';
  name: string;
  title: string;
  unit: string;
  bars: { name: string; label: string; si: number; role?: 'claim' | 'bound' | 'artifact' }[];
  yScale: 'linear' | 'log';
}

export type CheckPlot = LinePlot | BarPlot;

export interface CheckResult {
  check: CheckName;
  outputs: CheckOutput[];
  verdict: CheckVerdict;
  plots: CheckPlot[];
}

export interface CheckDefinition {
  name: CheckName;
  title: string;
  /** Plain words: what the check shows and when to use it. */
  summary: string;
  /** The condition the verdict reports on, in words, e.g. "claimed thrust ≤ P/c". */
  condition: string;
  inputs: CheckInputSpec[];
  /** Safety cautions where the check touches dangerous work; empty when none apply. */
  cautions: string[];
  /** Inputs in SI (keys are CheckInputSpec names), already validated against min/max. */
  run(si: Record<string, number>): CheckResult;
}
