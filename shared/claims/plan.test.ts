/**
 * Which checks a claim's figures allow, and their results: compared with the check kit (runCheck on
 * the same typed inputs) and with textbook formulas. The figures are invented test data.
 */
import { runCheck } from '../checks/run';
import { formatQuantity, parseQuantity } from '../worksheet/quantity';
import { planChecks, runClaimChecks } from './plan';
import { FIGURE_SI_UNIT, type Figure, type FigureKind, type FigureRole } from './types';

let n = 0;
function fig(kind: FigureKind, quantity: string, role: FigureRole = null): Figure {
  const unit = FIGURE_SI_UNIT[kind];
  const si = parseQuantity(quantity, unit);
  n += 1;
  return { id: `f${n}`, kind, quantity, text: quantity, start: null, end: null, si, unit, display: formatQuantity(si, unit), role };
}
beforeEach(() => (n = 0));

// c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th ed., §2.2, the defining constant).
const C = 299_792_458;

describe('thrust with power', () => {
  const figures = () => [fig('thrust', '0.2 lbf'), fig('power', '1.5 kW', 'in')];

  it('plans the photon bound and the break-even speed on those figures', () => {
    const { planned } = planChecks(figures());
    expect(planned.map((p) => p.check)).toEqual(['photon-bound', 'break-even-speed']);
    expect(planned[0]).toMatchObject({ inputs: { F_claimed: '0.2 lbf', P: '1.5 kW' }, uses: ['f1', 'f2'], assumptions: [] });
    // The break-even check also takes a mass and a speed; the text gave neither, and that is said.
    expect(planned[1].assumptions.join(' ')).toMatch(/default/);
  });

  it('gives the same results as the check kit and as P/c', () => {
    const { checks } = runClaimChecks(figures());
    const photon = checks.find((c) => c.check === 'photon-bound')!;
    const kit = runCheck('photon-bound', { F_claimed: '0.2 lbf', P: '1.5 kW' });
    expect(photon.outputs).toEqual(kit.outputs.map(({ name, label, si, unit, display }) => ({ name, label, si, unit, display })));
    expect(photon.verdict).toEqual(kit.verdict);
    const bound = photon.outputs.find((o) => o.name === 'F_bound')!.si;
    expect(bound).toBeCloseTo(1500 / C, 15); // photon-rocket bound F = P/c (any mechanics text; from memory)
    // 1 lbf = 4.448 222 N (NIST SP 811, Appendix B.8); ratio = 0.2 lbf / (P/c).
    expect(photon.outputs.find((o) => o.name === 'ratio')!.si / ((0.2 * 4.4482216152605) / (1500 / C))).toBeCloseTo(1, 12);
    expect(photon.verdict.holds).toBe(false);
    const be = checks.find((c) => c.check === 'break-even-speed')!;
    // Break-even speed v = P/F (kinetic power F·v equals the input power).
    expect(be.outputs.find((o) => o.name === 'v_break_even')!.si).toBeCloseTo(1500 / (0.2 * 4.4482216152605), 9);
    expect(be.permalink).toBe('/checks/break-even-speed?F=0.2%20lbf&P=1.5%20kW');
  });

  it('uses a mass and a speed when the text gives them', () => {
    const { planned } = planChecks([...figures(), fig('mass', '250 kg'), fig('speed', '8 km/s')]);
    expect(planned[1].inputs).toEqual({ F: '0.2 lbf', P: '1.5 kW', m: '250 kg', v: '8 km/s' });
    expect(planned[1].assumptions).toEqual([]);
  });

  it('notes a thrust without a power', () => {
    const { planned, notes } = planChecks([fig('thrust', '3 mN')]);
    expect(planned).toEqual([]);
    expect(notes.join(' ')).toMatch(/no input power/);
  });

  it('sizes the bench artifacts when a current is given', () => {
    const { checks } = runClaimChecks([fig('thrust', '40 uN'), fig('current', '3 A'), fig('power', '60 W', 'in')]);
    const art = checks.find((c) => c.check === 'artifact-budget')!;
    expect(art.inputs).toMatchObject({ F_claimed: '40 uN', I: '3 A', P_heat: '60 W' });
    const lorentz = art.outputs.find((o) => o.name === 'F_lorentz')!.si;
    // Lorentz force on a straight wire across a field, F = I·L·B (any electromagnetism text; from memory),
    // with the check's defaults L = 10 cm and B = 50 µT (a typical value of the Earth's field, shared/checks/constants.ts).
    const kit = runCheck('artifact-budget', art.inputs);
    expect(lorentz).toBe(kit.outputs.find((o) => o.name === 'F_lorentz')!.si);
    expect(lorentz).toBeCloseTo(3 * 0.1 * 50e-6, 15);
    expect(art.assumptions.join(' ')).toMatch(/heat/);
  });
});

describe('temperatures with an efficiency or a COP', () => {
  it('runs Carnot with the higher temperature as the hot one', () => {
    const { checks } = runClaimChecks([fig('temperature', '20 degC'), fig('temperature', '90 degC'), fig('efficiency', '45 %')]);
    const carnot = checks.find((c) => c.check === 'carnot')!;
    expect(carnot.inputs).toEqual({ Th: '90 degC', Tc: '20 degC', eta_claimed: '45 %', cop_heating_claimed: '0', cop_cooling_claimed: '0' });
    // Carnot efficiency 1 − Tc/Th with T/K = t/°C + 273.15 (NIST SP 811 §4.2.1.1).
    expect(carnot.outputs.find((o) => o.name === 'eta_max')!.si).toBeCloseTo(1 - 293.15 / 363.15, 12);
    expect(carnot.verdict.holds).toBe(false);
    expect(carnot.assumptions.join(' ')).toMatch(/higher temperature/);
  });

  it('reads a cooling COP as one', () => {
    const { planned } = planChecks([fig('temperature', '-18 degC', 'cold'), fig('temperature', '25 degC', 'hot'), fig('cop', '9', 'cooling')]);
    expect(planned[0].inputs).toEqual({ Th: '25 degC', Tc: '-18 degC', eta_claimed: '0', cop_heating_claimed: '0', cop_cooling_claimed: '9' });
    expect(planned[0].assumptions).toEqual([]);
  });

  it('says so when only one temperature is given', () => {
    const { planned, notes } = planChecks([fig('temperature', '60 degC'), fig('efficiency', '0.7')]);
    expect(planned).toEqual([]);
    expect(notes.join(' ')).toMatch(/only one temperature/);
  });

  it('turns a Tc above Th given as roles into a note, not a crash', () => {
    const { checks, notes } = runClaimChecks([fig('temperature', '400 K', 'cold'), fig('temperature', '300 K', 'hot'), fig('efficiency', '0.2')]);
    expect(checks).toEqual([]);
    expect(notes.join(' ')).toMatch(/could not be run/);
  });
});

describe('energy in and out', () => {
  it('balances energies with their roles', () => {
    const { checks } = runClaimChecks([fig('energy', '2 kWh', 'in'), fig('energy', '5 kWh', 'out')]);
    const fl = checks.find((c) => c.check === 'first-law')!;
    // 1 kWh = 3.6 × 10^6 J (NIST SP 811, Appendix B.8); over-unity ratio out/in = 2.5.
    expect(fl.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo(2.5, 12);
    expect(fl.outputs.find((o) => o.name === 'balance')!.si).toBeCloseTo(-3 * 3.6e6, 3);
    expect(fl.verdict.holds).toBe(false);
  });

  it('balances powers in and out over one hour, and says so', () => {
    const { checks } = runClaimChecks([fig('power', '120 W', 'in'), fig('power', '0.5 hp', 'out')]);
    const fl = checks.find((c) => c.check === 'first-law')!;
    // 1 hp (550 ft·lbf/s) = 745.699 9 W (NIST SP 811, Appendix B.8).
    expect(fl.outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo((0.5 * 745.69987158227) / 120, 9);
    expect(fl.assumptions[0]).toMatch(/one hour/);
  });

  it('reads an efficiency above 1 as energy out over energy in', () => {
    const { checks } = runClaimChecks([fig('efficiency', '300 %')]);
    expect(checks.map((c) => c.check)).toEqual(['first-law']);
    expect(checks[0].outputs.find((o) => o.name === 'over_unity')!.si).toBeCloseTo(3, 12);
  });

  it('takes two energies without roles as in, then out, and says so', () => {
    const { planned } = planChecks([fig('energy', '10 kJ'), fig('energy', '14 kJ')]);
    expect(planned[0].inputs).toMatchObject({ E_in: '10 kJ', W_out: '14 kJ' });
    expect(planned[0].assumptions[0]).toMatch(/swap/);
  });
});

it('plans nothing for no figures', () => {
  expect(runClaimChecks([])).toEqual({ checks: [], notes: [] });
});
