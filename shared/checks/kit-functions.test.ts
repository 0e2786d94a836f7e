import { create, all, type Unit } from 'mathjs';
import * as formulas from './formulas';
import { kitFunctions } from './kit-functions';

// mathjs is the outside reference here: a general-purpose unit library doing the same arithmetic on
// quantities with units, with its own constants (speedOfLight, gravity).
const math = create(all);

const unit = (u: string) => (u === '' ? null : math.unit(1, u));

describe('kit functions for worksheets', () => {
  test('the names the worksheets call', () => {
    for (const name of [
      'photon_thrust_bound',
      'break_even_speed',
      'carnot_efficiency',
      'carnot_cop_heating',
      'carnot_cop_cooling',
      'tsiolkovsky_dv',
      'lead_lorentz_force',
      'radiation_recoil_force',
      'outgassing_force',
      'gyro_frequency',
      'gyro_radius',
    ]) {
      expect(kitFunctions[name]).toBeDefined();
    }
    for (const name of Object.keys(kitFunctions)) expect(name).toMatch(/^[a-z][a-z0-9_]*$/);
  });

  test('each function is the very formula the checks use (no second copy)', () => {
    const cores = new Set<unknown>(Object.values(formulas));
    for (const [name, k] of Object.entries(kitFunctions)) {
      expect([name, cores.has(k.fn)]).toEqual([name, true]);
      expect(k.fn.length).toBe(k.args.length);
      expect(k.summary.length).toBeGreaterThan(10);
    }
  });

  test('declared units are mathjs units', () => {
    for (const k of Object.values(kitFunctions)) {
      for (const a of k.args) expect(() => unit(a.unit)).not.toThrow();
      expect(() => unit(k.unit)).not.toThrow();
    }
  });

  // Each case: the kit function on SI numbers against mathjs evaluating the textbook expression on
  // quantities with units; the result must have the declared unit's dimension and the same value.
  const cases: { fn: string; args: number[]; expr: string }[] = [
    { fn: 'photon_thrust_bound', args: [1000], expr: '1000 W / speedOfLight' },
    { fn: 'break_even_speed', args: [1000, 1e-3], expr: '1000 W / 1 mN' },
    { fn: 'kinetic_power', args: [2, 3], expr: '2 N * 3 m/s' },
    { fn: 'exhaust_speed_from_isp', args: [300], expr: '300 s * gravity' },
    { fn: 'tsiolkovsky_dv', args: [3000, 1000, 300], expr: '3000 m/s * log(1000 kg / 300 kg)' },
    { fn: 'lead_lorentz_force', args: [2, 0.1, 50e-6], expr: '2 A * 10 cm * 50 uT' },
    { fn: 'radiation_recoil_force', args: [50, 0.1], expr: '0.1 * 50 W / speedOfLight' },
    { fn: 'thermal_drift_force', args: [1e-6, 2], expr: '1 uN/K * 2 K' },
    { fn: 'outgassing_force', args: [1e-9, 300], expr: '1 ug/s * 300 m/s' },
    { fn: 'gyro_frequency', args: [1.602176634e-19, 1, 9.1093837139e-31, 2], expr: '1.602176634e-19 C * 1 T / (2 * 9.1093837139e-31 kg) * 1 rad' },
    { fn: 'gyro_radius', args: [1e-21, 1.602176634e-19, 0.5], expr: '1e-21 kg m/s / (1.602176634e-19 C * 0.5 T)' },
    { fn: 'gamma_from_kinetic_energy', args: [8.187e-14, 9.1093837139e-31], expr: '1 + 8.187e-14 J / (9.1093837139e-31 kg * speedOfLight^2)' },
    { fn: 'first_law_balance', args: [1000, 900, 50], expr: '1000 J - 900 J - 50 J' },
    { fn: 'over_unity_ratio', args: [1000, 1100, 0], expr: '1100 J / 1000 J' },
    { fn: 'carnot_efficiency', args: [500, 300], expr: '1 - 300 K / 500 K' },
    { fn: 'carnot_cop_heating', args: [500, 300], expr: '500 K / (500 K - 300 K)' },
    { fn: 'carnot_cop_cooling', args: [500, 300], expr: '300 K / (500 K - 300 K)' },
    // Faraday's law n = I t/(z F) and the ideal-gas law V = n R T/p, with mathjs's CODATA 2018 faraday and gasConstant.
    { fn: 'faraday_moles', args: [10, 3600, 2], expr: '10 A * 3600 s / (2 * faraday)' },
    { fn: 'ideal_gas_volume', args: [1, 273.15, 101325], expr: '1 mol * gasConstant * 273.15 K / 101325 Pa' },
    { fn: 'atoms_in_mass', args: [1e-3, 58.6934e-3], expr: '1 g * avogadro / (58.6934 g/mol)' },
    { fn: 'reaction_rate', args: [10, 5.2e-13], expr: '10 W / 5.2e-13 J' },
    { fn: 'isotropic_fluence_rate', args: [1e6, 2], expr: '1e6 Hz / (4 * pi * (2 m)^2)' },
    { fn: 'aerodynamic_drag', args: [1.225, 0.3, 2.2, 27.5], expr: '0.5 * 1.225 kg/m^3 * 0.3 * 2.2 m^2 * (27.5 m/s)^2' },
    { fn: 'rolling_resistance', args: [0.01, 1500], expr: '0.01 * 1500 kg * gravity' },
    { fn: 'road_load', args: [1.225, 0.3, 2.2, 27.5, 0.01, 1500], expr: '0.5 * 1.225 kg/m^3 * 0.3 * 2.2 m^2 * (27.5 m/s)^2 + 0.01 * 1500 kg * gravity' },
    { fn: 'generator_drag', args: [5000, 27.5], expr: '5000 W / (27.5 m/s)' },
    { fn: 'landsberg_efficiency', args: [6000, 300], expr: '1 - 4/3 * (300 K / 6000 K) + 1/3 * (300 K / 6000 K)^4' },
    { fn: 'photon_conversion_bound', args: [0.9, 0.8, 2.2e-19], expr: '0.9 * elementaryCharge * 0.8 V / 2.2e-19 J' },
    { fn: 'landauer_bound', args: [300], expr: 'boltzmann * 300 K * log(2)' },
  ];
  test.each(cases)('$fn agrees with mathjs on quantities with units', ({ fn, args, expr }) => {
    const k = kitFunctions[fn];
    const got = k.fn(...args);
    const ref = math.evaluate(expr) as number | Unit;
    if (typeof ref === 'number') {
      expect(k.unit).toBe('');
      expect(Math.abs(got / ref - 1)).toBeLessThan(1e-12);
    } else {
      const declared = math.unit(1, k.unit);
      expect(ref.equalBase(declared)).toBe(true);
      expect(Math.abs(got / ref.toNumber(k.unit) - 1)).toBeLessThan(1e-9);
    }
  });

  test('every kit function is covered by a reference case above', () => {
    expect(new Set(cases.map((c) => c.fn))).toEqual(new Set(Object.keys(kitFunctions)));
  });
});
