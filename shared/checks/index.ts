/**
 * The standard check kit (DESIGN.md §4): the checks by name and in order, the error they throw
 * for bad figures, and the helpers the API and screens may want.
 */
import { artifactBudget } from './artifact-budget';
import { breakEvenSpeedCheck } from './break-even-speed';
import { carnot } from './carnot';
import { firstLaw } from './first-law';
import { faradayYield } from './faraday-yield';
import { landauer } from './landauer';
import { lightConverterLimits } from './light-converter-limits';
import { lightSpeed } from './light-speed';
import { momentumLedger } from './momentum-ledger';
import { nuclearSignature } from './nuclear-signature';
import { photonBound } from './photon-bound';
import { roadLoadCheck } from './road-load';
import { rocketEquation } from './rocket-equation';
import { sidewaysBeam } from './sideways-beam';
import { CHECK_NAMES, type CheckDefinition, type CheckName } from './types';

export const checks: Record<CheckName, CheckDefinition> = {
  'photon-bound': photonBound,
  'break-even-speed': breakEvenSpeedCheck,
  carnot,
  'first-law': firstLaw,
  'momentum-ledger': momentumLedger,
  'sideways-beam': sidewaysBeam,
  'artifact-budget': artifactBudget,
  'rocket-equation': rocketEquation,
  'light-speed': lightSpeed,
  'faraday-yield': faradayYield,
  'nuclear-signature': nuclearSignature,
  'road-load': roadLoadCheck,
  'light-converter-limits': lightConverterLimits,
  landauer,
};

export const checkList: CheckDefinition[] = CHECK_NAMES.map((name) => checks[name]);

export function isCheckName(name: string): name is CheckName {
  return (CHECK_NAMES as readonly string[]).includes(name);
}

export { CheckRangeError, isCheckRangeError } from './errors';
export { readInputs as validateCheckInputs } from './inputs';
export { fmt, fmtQ } from './format';
export { kitFunctions } from './kit-functions';
export * from './types';
