/**
 * Runs a check of the kit on typed inputs ("0.2 lbf", "1.5 kW", or { value, unit }): parses each
 * input into the SI unit the check wants, applies defaults and bounds, runs it, and adds display
 * strings. The same function serves the check screens (live, in the browser) and the API.
 */
import { formatQuantity, parseQuantity, QuantityError, toQuantityValue } from '../worksheet/quantity';
import type { QuantityValue } from '../worksheet/types';
import { CheckRangeError } from './errors';
import { checks, isCheckName } from './index';
import { readInputs } from './inputs';
import type { CheckName, CheckOutput, CheckPlot, CheckVerdict } from './types';

export { isCheckName };

export type RawInput = string | { value: number; unit: string };

export interface CheckRun {
  check: CheckName;
  inputs: Record<string, QuantityValue>;
  outputs: (CheckOutput & { display: string })[];
  verdict: CheckVerdict;
  plots: CheckPlot[];
}

/** Bad inputs, keyed by field path (`inputs.<name>`), each with a plain-words message. */
export class CheckInputError extends Error {
  constructor(readonly fields: Record<string, string>) {
    super(Object.values(fields)[0] ?? 'The inputs are not valid.');
    this.name = 'CheckInputError';
  }
}

export function runCheck(name: CheckName, raw: Partial<Record<string, RawInput>> = {}): CheckRun {
  const def = checks[name];
  const fields: Record<string, string> = {};
  const si: Record<string, number> = {};
  const inputs: Record<string, QuantityValue> = {};
  const known = new Set(def.inputs.map((i) => i.name));
  for (const key of Object.keys(raw)) {
    if (!known.has(key)) fields[`inputs.${key}`] = `"${key}" is not an input of this check; it takes ${[...known].join(', ')}.`;
  }
  for (const spec of def.inputs) {
    const given = raw[spec.name];
    try {
      const difference = spec.kind === 'difference'; // "2 degC" of rise is 2 K, not 275.15 K
      const value = parseQuantity(given === undefined || given === '' ? spec.default : given, spec.unit, { difference });
      readInputs([spec], { [spec.name]: value }); // bounds and whole numbers, as the check itself reads them
      si[spec.name] = value;
      inputs[spec.name] = toQuantityValue(value, spec.unit, spec.displayUnit, { difference });
    } catch (err) {
      if (err instanceof QuantityError) fields[`inputs.${spec.name}`] = `${spec.label}: ${err.message}`;
      else if (err instanceof CheckRangeError) fields[`inputs.${spec.name}`] = err.message;
      else throw err;
    }
  }
  if (Object.keys(fields).length) throw new CheckInputError(fields);

  let result;
  try {
    result = def.run(si);
  } catch (err) {
    if (err instanceof CheckRangeError) throw new CheckInputError({ [`inputs.${err.field}`]: err.message });
    throw err;
  }
  return {
    check: name,
    inputs,
    outputs: result.outputs.map((o) => ({ ...o, display: formatQuantity(o.si, o.unit, { displayUnit: o.displayUnit }) })),
    verdict: result.verdict,
    plots: result.plots,
  };
}
