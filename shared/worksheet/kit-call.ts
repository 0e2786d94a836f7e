/** Kit functions (the check kit's formulas) as mathjs functions: arguments in, quantity out. */
import { KitCallError } from './compiled';
import type { KitFunction } from './types';
import { describeDims, fromSI, isDimensionless, sameDims, toSI, unitInfo, type UnitInfo } from './units';
import { describeValue, isUnitValue, makeUnit, siOfUnit } from './values';

/** Converts an argument of a kit function to a number in the declared unit. */
function kitArgument(fnName: string, argName: string, value: unknown, info: UnitInfo): number {
  if (typeof value === 'number') {
    if (isDimensionless(info.dims)) return fromSI(value, info);
    throw new KitCallError(
      'dimension',
      `${fnName}(): the argument ${argName} must be ${describeDims(info.dims)}, but it is a pure number`,
    );
  }
  if (isUnitValue(value)) {
    if (!sameDims(value.dimensions, info.dims)) {
      throw new KitCallError(
        'dimension',
        `${fnName}(): the argument ${argName} must be ${describeDims(info.dims)}, but it is ${describeDims(value.dimensions)}`,
      );
    }
    return fromSI(siOfUnit(value), info);
  }
  throw new KitCallError('value', `${fnName}(): the argument ${argName} must be a quantity, but it is ${describeValue(value)}`);
}

export function makeKitWrapper(name: string, spec: KitFunction): (...args: unknown[]) => unknown {
  const argInfos = spec.args.map((a) => unitInfo(a.unit));
  const resultInfo = unitInfo(spec.unit);
  const signature = spec.args.map((a) => a.name).join(', ');
  return (...args: unknown[]) => {
    if (args.length !== spec.args.length) {
      throw new KitCallError('syntax', `${name}(${signature}) takes ${spec.args.length} argument${spec.args.length === 1 ? '' : 's'}, not ${args.length}`);
    }
    const nums = args.map((a, i) => kitArgument(name, spec.args[i].name, a, argInfos[i]));
    let r: number;
    try {
      r = spec.fn(...nums);
    } catch (e) {
      throw new KitCallError('value', `${name}(): ${(e as Error).message}`);
    }
    if (typeof r !== 'number') throw new KitCallError('value', `${name}() did not give a number`);
    return makeUnit(toSI(r, resultInfo), resultInfo.dims);
  };
}
