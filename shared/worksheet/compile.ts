/**
 * Compiling a worksheet: names checked, units read, every expression parsed and vetted once, the
 * dependencies of steps and checks found and each plot's sweep laid out (plot.ts). Problems found
 * here are reported by field path before any value is typed.
 */
import { ALLOWED_FUNCTIONS, RESERVED_WORDS } from './allowed';
import { CONSTANTS, CONSTANT_HINTS, getConstant } from './constants';
import {
  err,
  label,
  parseTemplate,
  quantityErrorOf,
  type CCheck,
  type CExpr,
  type CInput,
  type CStep,
  type CompileOptions,
  type Problem,
  type Program,
} from './compiled';
import { makeKitWrapper } from './kit-call';
import { ExpressionError } from './math';
import { vetExpression } from './vet';
import { compilePlot } from './plot';
import { parseQuantity } from './quantity';
import type { Worksheet } from './schema';
import type { EvaluationError } from './types';
import { asDifference, unitInfo, type UnitInfo } from './units';
import { makeUnit } from './values';

export function compileProgram(ws: Worksheet, opts: CompileOptions = {}): Program {
  const kit = opts.functions ?? {};
  const kitNames = new Set(Object.keys(kit));
  const problems: Problem[] = [];

  const scope = new Map<string, unknown>();
  for (const k of CONSTANTS) scope.set(k.name, makeUnit(k.value, unitInfo(k.unit).dims));
  for (const [name, spec] of Object.entries(kit)) scope.set(name, makeKitWrapper(name, spec));

  const inputNames = new Set(ws.inputs.map((i) => i.name));
  const stepIndex = new Map(ws.steps.map((s, i) => [s.name, i]));
  const checkNames = new Set(ws.checks.map((c) => c.name));
  const plotNames = new Set(ws.plots.map((p) => p.name));
  const valueNames = new Set<string>([...inputNames, ...stepIndex.keys(), ...CONSTANTS.map((k) => k.name)]);

  const nameProblem = (name: string): EvaluationError | undefined => {
    const k = getConstant(name);
    if (k) return err('syntax', `"${name}" is the name of a constant (the ${k.label}); give this another name`);
    if (RESERVED_WORDS.has(name)) return err('syntax', `"${name}" is a reserved word in expressions; give this another name`);
    if (ALLOWED_FUNCTIONS.has(name)) return err('syntax', `"${name}" is the name of the function ${name}(); give this another name`);
    if (kitNames.has(name)) return err('syntax', `"${name}" is the name of a check-kit function; give this another name`);
    if (name === 'pi' || name === 'tau') return err('syntax', `"${name}" is the number ${name}; give this another name`);
    return undefined;
  };

  // ---- inputs
  const inputs: CInput[] = ws.inputs.map((def, index) => {
    const difference = def.kind === 'difference';
    const ci: CInput = { index, name: def.name, label: def.label, unit: def.unit, difference, defaultText: def.default };
    const bad = nameProblem(def.name);
    if (bad) {
      ci.staticError = label('Input', def.name, bad);
      problems.push({ path: ['inputs', index, 'name'], error: ci.staticError });
      return ci;
    }
    try {
      ci.info = difference ? asDifference(unitInfo(def.unit)) : unitInfo(def.unit);
    } catch (e) {
      ci.staticError = label('Input', def.name, quantityErrorOf(e));
      problems.push({ path: ['inputs', index, 'unit'], error: ci.staticError });
      return ci;
    }
    for (const which of ['min', 'max'] as const) {
      const text = def[which];
      if (text === undefined) continue;
      try {
        const si = parseQuantity(text, def.unit, { difference });
        if (which === 'min') ci.minSi = si;
        else ci.maxSi = si;
      } catch (e) {
        ci.staticError = label('Input', def.name, { ...quantityErrorOf(e), message: `${which}: ${quantityErrorOf(e).message}` });
        problems.push({ path: ['inputs', index, which], error: ci.staticError });
        return ci;
      }
    }
    return ci;
  });
  const inputByName = new Map(inputs.map((i) => [i.name, i]));

  // ---- expressions
  const compileExpr = (
    text: string,
    kind: 'Step' | 'Check',
    owner: string,
    path: (string | number)[],
    available: (name: string) => EvaluationError | undefined,
  ): CExpr => {
    try {
      const vetted = vetExpression(text, { valueNames, functions: kitNames, hints: CONSTANT_HINTS });
      for (const sym of vetted.symbols) {
        const problem = available(sym);
        if (problem) throw new ExpressionError(problem.kind, problem.message);
      }
      for (const call of vetted.calls) {
        const spec = kit[call.name];
        if (spec && spec.args.length !== call.argc) {
          const sig = spec.args.map((a) => a.name).join(', ');
          throw new ExpressionError('syntax', `${call.name}(${sig}) takes ${spec.args.length} argument${spec.args.length === 1 ? '' : 's'}, not ${call.argc}`);
        }
      }
      const deps = vetted.symbols.filter((s) => inputNames.has(s) || stepIndex.has(s));
      return { code: vetted.code, node: vetted.node, deps };
    } catch (e) {
      const error = label(kind, owner, quantityErrorOf(e));
      problems.push({ path, error });
      return { deps: [], staticError: error };
    }
  };

  const notAValue = (name: string): EvaluationError | undefined => {
    if (checkNames.has(name)) return err('unknown_symbol', `"${name}" is a check, not a value`);
    if (plotNames.has(name)) return err('unknown_symbol', `"${name}" is a plot, not a value`);
    return undefined;
  };

  const steps: CStep[] = ws.steps.map((def, index) => {
    const bad = nameProblem(def.name);
    if (bad) {
      const error = label('Step', def.name, bad);
      problems.push({ path: ['steps', index, 'name'], error });
      return { index, name: def.name, label: def.label, deps: [], staticError: error };
    }
    let declared: UnitInfo | undefined;
    if (def.unit !== undefined) {
      try {
        declared = unitInfo(def.unit);
      } catch (e) {
        const error = label('Step', def.name, { ...quantityErrorOf(e), message: `its unit: ${quantityErrorOf(e).message}` });
        problems.push({ path: ['steps', index, 'unit'], error });
        return { index, name: def.name, label: def.label, deps: [], staticError: error };
      }
    }
    const expr = compileExpr(def.expression, 'Step', def.name, ['steps', index, 'expression'], (sym) => {
      const j = stepIndex.get(sym);
      if (j !== undefined && j === index) return err('unknown_symbol', `"${sym}" is this step's own name; a step cannot use its own result`);
      if (j !== undefined && j > index) {
        return err('unknown_symbol', `"${sym}" is a later step; a step can use only inputs, constants and the steps above it`);
      }
      return notAValue(sym);
    });
    return { index, name: def.name, label: def.label, declared, declaredText: def.unit, ...expr };
  });

  const quotable = (name: string) => inputNames.has(name) || stepIndex.has(name) || !!getConstant(name);

  const checks: CCheck[] = ws.checks.map((def, index) => {
    const holds = parseTemplate(def.holds);
    const fails = parseTemplate(def.fails);
    const bad = nameProblem(def.name);
    if (bad) {
      const error = label('Check', def.name, bad);
      problems.push({ path: ['checks', index, 'name'], error });
      return { name: def.name, label: def.label, holds, fails, deps: [], staticError: error };
    }
    const expr = compileExpr(def.condition, 'Check', def.name, ['checks', index, 'condition'], notAValue);
    if (!expr.staticError) {
      for (const [field, tpl] of [['holds', holds], ['fails', fails]] as const) {
        for (const part of tpl) {
          if (typeof part === 'string') continue;
          if (!quotable(part.name)) {
            const error = label('Check', def.name, err('unknown_symbol', `the message quotes {${part.name}}, which is not an input, a step or a constant`));
            problems.push({ path: ['checks', index, field], error });
            return { name: def.name, label: def.label, holds, fails, deps: [], staticError: error };
          }
          if ((inputNames.has(part.name) || stepIndex.has(part.name)) && !expr.deps.includes(part.name)) expr.deps.push(part.name);
        }
      }
    }
    return { name: def.name, label: def.label, holds, fails, ...expr };
  });

  const partial = { worksheet: ws, scope, problems, inputs, inputNames, inputByName, steps, stepIndex, checks };
  const plots = ws.plots.map((def, index) => compilePlot(def, index, partial));
  return { ...partial, plots };
}
