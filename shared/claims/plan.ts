/**
 * Which standard checks a claim's figures allow, and running them (issue 6, item 4c). The rules:
 *  - a thrust with a power            → photon-bound and break-even-speed (mass and speed when given);
 *  - two temperatures with an efficiency or a COP → carnot (the higher, or the one called hot, is Th);
 *  - an energy in and an energy out   → first-law; a power in and a power out → first-law over one
 *    hour of steady running (stated as an assumption); an efficiency above 1 with no two
 *    temperatures → first-law on 1 kJ supplied (stated);
 *  - a thrust with an electric current → artifact-budget (the Lorentz force on the leads is then
 *    the text's own; the other artifacts take the check's typical bench values, stated).
 * Every input a check takes that the text did not give keeps the check's default, and that is said
 * in `assumptions`. The checks are run with runCheck, the same function as the check screens.
 */
import { checks } from '../checks';
import { CheckInputError, runCheck } from '../checks/run';
import type { CheckName } from '../checks/types';
import { formatQuantity } from '../worksheet/quantity';
import type { ClaimCheckRun, Figure, FigureKind, PlannedCheck } from './types';

const ofKind = (figures: Figure[], kind: FigureKind) => figures.filter((f) => f.kind === kind);

/** The first figure of a kind with this role, else (when `fallback`) the first with no role. */
function pick(figures: Figure[], kind: FigureKind, role: Figure['role'], fallback = true): Figure | undefined {
  const all = ofKind(figures, kind);
  return all.find((f) => f.role === role) ?? (fallback ? all.find((f) => f.role === null) : undefined);
}

/** A typed quantity for an SI value, exact enough to read back (17 significant figures). */
const typed = (si: number, unit: string) => `${Number(si.toPrecision(17))} ${unit}`.trim();

function withDefaults(check: CheckName, given: Record<string, string>): { inputs: Record<string, string>; assumptions: string[] } {
  const assumptions: string[] = [];
  for (const spec of checks[check].inputs) {
    if (given[spec.name] !== undefined) continue;
    assumptions.push(`${spec.label}: ${spec.default} (the check's default; the text does not give it).`);
  }
  return { inputs: given, assumptions };
}

function plan(check: CheckName, given: Record<string, string>, uses: Figure[], why: string, extra: string[] = []): PlannedCheck {
  const { inputs, assumptions } = withDefaults(check, given);
  return { check, inputs, uses: uses.map((f) => f.id), why, assumptions: [...extra, ...assumptions] };
}

export function planChecks(figures: Figure[]): { planned: PlannedCheck[]; notes: string[] } {
  const planned: PlannedCheck[] = [];
  const notes: string[] = [];
  const thrust = ofKind(figures, 'thrust')[0];
  const powerIn = pick(figures, 'power', 'in');
  const anyPower = powerIn ?? ofKind(figures, 'power')[0];
  const mass = ofKind(figures, 'mass')[0];
  const speed = ofKind(figures, 'speed')[0];
  const current = ofKind(figures, 'current')[0];

  // Thrust and power.
  if (thrust && anyPower) {
    planned.push(
      plan('photon-bound', { F_claimed: thrust.quantity, P: anyPower.quantity }, [thrust, anyPower], 'The text gives a thrust and the power that produces it.'),
    );
    const given: Record<string, string> = { F: thrust.quantity, P: anyPower.quantity };
    const uses = [thrust, anyPower];
    if (mass) (given.m = mass.quantity), uses.push(mass);
    if (speed) (given.v = speed.quantity), uses.push(speed);
    planned.push(plan('break-even-speed', given, uses, 'A constant thrust on a constant power: the kinetic power F·v passes the input power at v = P/F.'));
  } else if (thrust) {
    notes.push('The text gives a thrust but no input power, so the photon bound and the break-even speed were not run; add the power to run them.');
  } else if (anyPower && /thrust|propel|push/i.test(figures.map((f) => f.text).join(' '))) {
    notes.push('No thrust figure was found, so the photon bound was not run.');
  }

  // Thrust with a current: the leads' Lorentz force is the text's own.
  if (thrust && current) {
    const given: Record<string, string> = { F_claimed: thrust.quantity, I: current.quantity };
    const uses = [thrust, current];
    if (anyPower) (given.P_heat = anyPower.quantity), uses.push(anyPower);
    const extra = anyPower ? ['All of the input power is taken to end as heat radiated from the device.'] : [];
    planned.push(plan('artifact-budget', given, uses, 'A small thrust measured on a device fed by a current: the usual bench artifacts, sized.', extra));
  }

  // Temperatures with an efficiency or a COP.
  const temps = ofKind(figures, 'temperature');
  const efficiency = ofKind(figures, 'efficiency')[0];
  const cop = ofKind(figures, 'cop')[0];
  if (temps.length >= 2 && (efficiency || cop)) {
    const hot = temps.find((t) => t.role === 'hot') ?? [...temps].sort((a, b) => b.si - a.si)[0];
    const cold = temps.find((t) => t.role === 'cold' && t !== hot) ?? [...temps].filter((t) => t !== hot).sort((a, b) => a.si - b.si)[0];
    // What the text does not claim is sent as 0 ("not claimed"), not left at the check's example default.
    const given: Record<string, string> = { Th: hot.quantity, Tc: cold.quantity, eta_claimed: '0', cop_heating_claimed: '0', cop_cooling_claimed: '0' };
    const uses = [hot, cold];
    const extra: string[] = [];
    if (hot.role !== 'hot' || cold.role !== 'cold') extra.push(`The higher temperature (${hot.display}) is taken as the hot reservoir and ${cold.display} as the cold one.`);
    if (efficiency) (given.eta_claimed = efficiency.quantity), uses.push(efficiency);
    if (cop) {
      const cooling = cop.role === 'cooling';
      given[cooling ? 'cop_cooling_claimed' : 'cop_heating_claimed'] = cop.quantity;
      uses.push(cop);
      if (cop.role === null) extra.push('The COP is read as a heating COP (heat delivered over work in); mark it as cooling if it is a refrigerator or chiller.');
    }
    planned.push(plan('carnot', given, uses, 'The text gives the temperatures the machine works between and what it claims to achieve there.', extra));
  } else if ((efficiency || cop) && temps.length < 2 && !(efficiency && efficiency.si > 1)) {
    notes.push(`The text gives ${efficiency ? 'an efficiency' : 'a COP'} but ${temps.length ? 'only one temperature' : 'no temperatures'}, so the Carnot bound was not run; add the hot and cold temperatures to run it.`);
  }

  // Energy (or power) in and out.
  const energies = ofKind(figures, 'energy');
  const eIn = pick(figures, 'energy', 'in', false);
  const eOut = pick(figures, 'energy', 'out', false);
  const pIn = pick(figures, 'power', 'in', false);
  const pOut = pick(figures, 'power', 'out', false);
  if (eIn && eOut) {
    planned.push(plan('first-law', { E_in: eIn.quantity, W_out: eOut.quantity, Q_out: '0 J' }, [eIn, eOut], 'The text gives the energy put in and the energy got out.', ['Heat out: 0 J (all of the output counted as work; any heat rejected only adds to the output).']));
  } else if (energies.length === 2 && !eIn && !eOut) {
    const [a, b] = energies;
    planned.push(
      plan('first-law', { E_in: a.quantity, W_out: b.quantity, Q_out: '0 J' }, [a, b], 'The text gives two energies; the first is read as the input and the second as the output.', [
        `The first energy (${a.display}) is read as the input and the second (${b.display}) as the output; swap their roles if that is wrong.`,
        'Heat out: 0 J (all of the output counted as work).',
      ]),
    );
  } else if (pIn && pOut) {
    const hour = 3600;
    planned.push(
      plan(
        'first-law',
        { E_in: typed(pIn.si * hour, 'J'), W_out: typed(pOut.si * hour, 'J'), Q_out: '0 J' },
        [pIn, pOut],
        'The text gives the power drawn and the power delivered.',
        [`Over one hour of steady running: ${pIn.display} in is ${formatQuantity(pIn.si * hour, 'J')}, ${pOut.display} out is ${formatQuantity(pOut.si * hour, 'J')}.`, 'Heat out: 0 J (all of the output counted as work).'],
      ),
    );
  } else if (efficiency && efficiency.si > 1 && temps.length < 2) {
    planned.push(
      plan('first-law', { E_in: '1 kJ', W_out: typed(efficiency.si * 1000, 'J'), Q_out: '0 J' }, [efficiency], 'An efficiency above 1 claims more energy out than in.', [
        `On 1 kJ supplied, an efficiency of ${efficiency.display} gives ${formatQuantity(efficiency.si * 1000, 'J')} out.`,
        'Heat out: 0 J.',
      ]),
    );
  } else if (eIn || eOut || ((pIn || pOut) && !(thrust && anyPower))) {
    notes.push('The text gives an energy or a power on one side only (in or out), so the first-law balance was not run; add the other side to run it.');
  }

  return { planned, notes };
}

/** The planned checks, run. A check the figures cannot run (say Tc above Th) becomes a note. */
export function runClaimChecks(figures: Figure[]): { checks: ClaimCheckRun[]; notes: string[] } {
  const { planned, notes } = planChecks(figures);
  const out: ClaimCheckRun[] = [];
  for (const p of planned) {
    const def = checks[p.check];
    try {
      const run = runCheck(p.check, p.inputs);
      out.push({
        ...p,
        title: def.title,
        outputs: run.outputs.map(({ name, label, si, unit, display }) => ({ name, label, si, unit, display })),
        verdict: run.verdict,
        inputsUsed: run.inputs,
        permalink: `/checks/${p.check}?${Object.entries(p.inputs).map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&')}`,
      });
    } catch (err) {
      if (!(err instanceof CheckInputError)) throw err;
      notes.push(`${def.title} could not be run on these figures: ${err.message}`);
    }
  }
  return { checks: out, notes };
}
